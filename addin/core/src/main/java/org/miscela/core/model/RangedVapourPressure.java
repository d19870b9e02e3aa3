package org.miscela.core.model;

/** A vapour-pressure form with the temperature range (K) its constants hold for. */
abstract class RangedVapourPressure implements VapourPressure {
    private final double lowestKelvin;
    private final double highestKelvin;

    RangedVapourPressure(double lowestKelvin, double highestKelvin) {
        this.lowestKelvin = lowestKelvin;
        this.highestKelvin = highestKelvin;
    }

    @Override
    public final double lowestKelvin() {
        return lowestKelvin;
    }

    @Override
    public final double highestKelvin() {
        return highestKelvin;
    }
}
