package org.miscela.core.model;

import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * Conventional mass, the result of weighing in air as OIML D 28 (2004) defines it: the conventional mass m_c of a body
 * is the mass of a reference body of density 8000 kg/m³ that balances it in air of density 1.2 kg/m³. Equal buoyancy
 * forces on the balance's two sides give m (1 − ρ_air/ρ) = m_c (1 − ρ_air/ρ_ref), so a body of density ρ has the
 * true mass m = m_c (1 − 1.2/8000) / (1 − 1.2/ρ): about 0.1 % more than its conventional mass for water.
 *
 * <p>OIML D 28 states the definition for a body at 20 °C; for a liquid weighed at another temperature this library
 * takes its density at that temperature (it is the volume then that the air buoys up). The constants are the
 * convention's, not the air of the day: conventional mass is what a balance calibrated with conventional-mass
 * weights shows, whatever the weather.
 */
public final class ConventionalMass {
    /** The conventional air density, kg/m³. */
    public static final double AIR = 1.2;
    /** The conventional density of the reference weights, kg/m³. */
    public static final double REFERENCE = 8000.0;

    private ConventionalMass() {
    }

    /**
     * m/m_c, true mass per unit of conventional mass, for a body of density {@code kgPerM3}: (1 − 1.2/8000)/(1 −
     * 1.2/ρ). Only meaningful for a body denser than the air (the caller checks): NaN or negative otherwise.
     */
    public static double trueMassPerConventional(double kgPerM3) {
        return (1.0 - AIR / REFERENCE) / (1.0 - AIR / kgPerM3);
    }

    /** Whether a body of this density can be weighed in air: denser than the conventional air, finite. */
    public static boolean weighable(double kgPerM3) {
        return kgPerM3 > AIR && kgPerM3 < Double.POSITIVE_INFINITY;
    }

    /**
     * m/m_c for a body that must be weighable, refused ({@link Problem#LIGHTER_THAN_AIR}) otherwise: {@code what}
     * names it ("ethanol", "the mixture") at the temperature {@code t} of the scale {@code unit}, and
     * {@code trueUnits} lists the true-mass units the message offers instead.
     */
    public static double trueMassPerConventional(double kgPerM3, String what, double t, String unit,
            String trueUnits) {
        if (!weighable(kgPerM3)) {
            throw Problem.LIGHTER_THAN_AIR.raise(what, Numbers.show(kgPerM3), Numbers.show(t), unit, trueUnits);
        }
        return trueMassPerConventional(kgPerM3);
    }
}
