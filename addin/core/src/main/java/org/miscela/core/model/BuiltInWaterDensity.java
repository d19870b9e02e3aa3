package org.miscela.core.model;

/** A built-in water-density formula: its name as written on a card and the temperatures it holds for (K). */
abstract class BuiltInWaterDensity implements PureDensity {
    private final String name;
    private final double lowestKelvin;
    private final double highestKelvin;

    BuiltInWaterDensity(String name, double lowestKelvin, double highestKelvin) {
        this.name = name;
        this.lowestKelvin = lowestKelvin;
        this.highestKelvin = highestKelvin;
    }

    @Override
    public final String modelName() {
        return name;
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
