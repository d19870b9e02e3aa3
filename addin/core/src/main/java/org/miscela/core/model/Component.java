package org.miscela.core.model;

/** A pure component of a mixture: its name, molar mass (g/mol), density model and heat capacity. Immutable. */
public final class Component {
    private final String name;
    private final double molarMass;
    private final PureDensity density;
    private final HeatCapacity heatCapacity;

    public Component(String name, double molarMassGramPerMol, PureDensity density) {
        this(name, molarMassGramPerMol, density, null);
    }

    /** @param heatCapacity null when the card gives none */
    public Component(String name, double molarMassGramPerMol, PureDensity density, HeatCapacity heatCapacity) {
        this.name = name;
        this.molarMass = molarMassGramPerMol;
        this.density = density;
        this.heatCapacity = heatCapacity;
    }

    /** The liquid's heat capacity, or null when the card gives none. */
    public HeatCapacity heatCapacity() {
        return heatCapacity;
    }

    public String name() {
        return name;
    }

    /** g/mol. */
    public double molarMass() {
        return molarMass;
    }

    public PureDensity density() {
        return density;
    }

    /** Molar volume of the pure liquid in cm³/mol: M / ρ with M in g/mol and ρ in kg/m³ (= g/L). */
    public double molarVolume(double kelvin) {
        return 1000.0 * molarMass / density.at(kelvin);
    }
}
