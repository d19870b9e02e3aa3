package org.miscela.core.model;

/** A density that does not change with temperature; adequate over a narrow temperature span. */
public final class ConstantDensity implements PureDensity {
    public static final String NAME = "constant";
    private final double kgPerM3;

    public ConstantDensity(double kgPerM3) {
        this.kgPerM3 = kgPerM3;
    }

    @Override
    public double at(double kelvin) {
        return kgPerM3;
    }

    @Override
    public String modelName() {
        return NAME;
    }
}
