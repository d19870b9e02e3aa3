package org.miscela.core.model;

/**
 * A component's pure-liquid density taken from a mixture-density model at that component alone: ρ_k(T) =
 * 1000/v(e_k, T). For the OIML R 22 formula these are the real densities of water and ethanol; for a solute of the
 * Laliberté–Cooper model the limit is no liquid at all ({@link #hypothetical}). Immutable.
 */
public final class ModelLimitDensity implements PureDensity {
    private final MixtureDensityModel model;
    private final int component;

    public ModelLimitDensity(MixtureDensityModel model, int component) {
        this.model = model;
        this.component = component;
    }

    @Override
    public double at(double kelvin) {
        double[] w = new double[model.componentCount()];
        w[component] = 1.0;
        return 1000.0 / model.specificVolume(w, kelvin, null, null);
    }

    @Override
    public String modelName() {
        return model.modelName();
    }

    /** Whether the limit is no real liquid (a solute of an apparent-volume model). */
    public boolean hypothetical() {
        return model.hypotheticalPure(component);
    }
}
