package org.miscela.core.fit;

import org.miscela.core.model.Component;

/**
 * The volumetric identities that link a binary mixture's density to its excess molar volume, in the library's
 * internal units (g/mol, cm³/mol, kg/m³ = g/L, K): V_m = 1000·(x1·M1 + x2·M2)/ρ and V^E = V_m − x1·V1* − x2·V2*.
 */
public final class MixtureVolumes {
    private MixtureVolumes() {
    }

    /** x1·M1 + x2·M2 in g/mol. */
    public static double molarMass(double x1, Component first, Component second) {
        return x1 * first.molarMass() + (1.0 - x1) * second.molarMass();
    }

    /** V_m of the ideal mixture, x1·V1* + x2·V2*, in cm³/mol. */
    public static double idealMolarVolume(double x1, double kelvin, Component first, Component second) {
        return x1 * first.molarVolume(kelvin) + (1.0 - x1) * second.molarVolume(kelvin);
    }

    /** V^E in cm³/mol from a measured density in kg/m³. */
    public static double excessVolume(double x1, double kelvin, double density, Component first, Component second) {
        return 1000.0 * molarMass(x1, first, second) / density - idealMolarVolume(x1, kelvin, first, second);
    }

    /** ρ in kg/m³ from an excess volume in cm³/mol. */
    public static double density(double x1, double kelvin, double excessVolume, Component first, Component second) {
        return 1000.0 * molarMass(x1, first, second)
                / (idealMolarVolume(x1, kelvin, first, second) + excessVolume);
    }
}
