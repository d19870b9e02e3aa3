package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.miscela.core.functions.AmountBasis;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.PropertyKind;
import org.miscela.core.problem.MiscelaException;

/**
 * A card written in °F describes the same mixture as the card in °C it was rewritten from (by {@link FahrenheitCards},
 * from the format's rules: t/°F = 1.8·t/°C + 32 and coefficients per °F^j, NIST SP 811 (2008), B.9): every function
 * gives the same number at the same temperature, and a temperature rise or a heat capacity per degree comes out per
 * °F (1.8 times, and 5/9 of, the °C card's). The cards are the test resources in °C plus one invented here with
 * temperature-dependent coefficients, covariance and heat capacities.
 */
class FahrenheitCardTest {
    private static final Extrapolation ALLOW = Extrapolation.ALLOW;
    /** Relative agreement: both cards round t + 273.15 and the coefficients differently, in the last digits only. */
    private static final double RELATIVE = 1e-11;
    /**
     * The sodium chloride card's Redlich–Kister terms (up to 4·10⁷ cm³/mol) cancel to an excess volume near 1, so a
     * coefficient's last-digit change from the rewriting shows some 10⁷ times larger there (2.4·10⁻¹¹ seen).
     */
    private static final double RELATIVE_CANCELLING = 1e-9;

    /**
     * Invented values: a pair whose A0 and A1 depend on temperature, with their covariance (four parameters), and
     * heat capacities quadratic in temperature about 30 °C.
     */
    static final Object[][] INVENTED = {{"Miscela card", 2.0}, {"source", "invented values, for tests"},
        {"temperature unit", "°C"}, {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"},
        {"molar mass unit", "g/mol"}, {"enthalpy unit", "J/mol"}, {"valid temperature", 5.0, 60.0},
        {"component", "P", 60.0}, {"component", "Q", 20.0}, {"density model", "P", "polynomial"},
        {"density reference temperature", "P", 20.0}, {"density coefficients", "P", 880.0, -0.9, -0.002},
        {"density model", "Q", "constant"}, {"density coefficients", "Q", 1010.0},
        {"valid mole fraction", "P", 0.0, 1.0}, {"excess volume reference temperature", "Q + P", 25.0},
        {"excess volume A0", "Q + P", -2.0, 0.01}, {"excess volume A1", "Q + P", 0.5, -0.004},
        {"excess volume covariance", "Q + P", 0.01, 0.0002, 0.001, 0.00001},
        {"excess volume covariance", "Q + P", 0.0002, 0.00004, 0.00002, 0.000003},
        {"excess volume covariance", "Q + P", 0.001, 0.00002, 0.004, 0.0001},
        {"excess volume covariance", "Q + P", 0.00001, 0.000003, 0.0001, 0.00002},
        {"excess enthalpy reference temperature", "P + Q", 30.0}, {"excess enthalpy A0", "P + Q", -1500.0, 8.0},
        {"excess enthalpy A1", "P + Q", 300.0, -2.0}, {"heat capacity reference temperature", "P", 30.0},
        {"heat capacity", "P", 150.0, 0.3, 0.001}, {"heat capacity reference temperature", "Q", 30.0},
        {"heat capacity", "Q", 75.0, -0.01, 0.0002}};

    static Stream<String> celsiusCards() {
        return Stream.of("ethanol-water-oiml.tsv", "ethanol-water-covariance.tsv", "sodium-chloride-water-crc.tsv",
                "sulfuric-acid-water-nbs.tsv", "invented-ternary.tsv", "ternary-invented.tsv", "invented-limits.tsv",
                "invented-endothermic.tsv", "water-ideal-partner.tsv", "invented");
    }

    private static Object[][] cells(String name) {
        return name.equals("invented") ? INVENTED : TestCards.cells(name);
    }

    @ParameterizedTest
    @MethodSource("celsiusCards")
    void aCardInFahrenheitDescribesTheSameMixture(String name) {
        Card c = CardReader.read(cells(name));
        Card f = CardReader.read(FahrenheitCards.convert(cells(name)));
        assertEquals(Units.Temperature.FAHRENHEIT, f.units().temperature());
        assertEquals(c.validity().lowestKelvin(), f.validity().lowestKelvin(), 1e-12);
        assertEquals(c.validity().highestKelvin(), f.validity().highestKelvin(), 1e-12);
        int n = c.componentCount();
        double lo = c.validity().lowestKelvin() - 273.15;
        double hi = c.validity().highestKelvin() - 273.15;
        double relative = name.startsWith("sodium-chloride") ? RELATIVE_CANCELLING : RELATIVE;
        int compared = 0;
        for (double share : new double[] {0.1, 0.5, 0.85}) {
            double x1 = c.validity().lowestFraction(0)
                    + share * (c.validity().highestFraction(0) - c.validity().lowestFraction(0));
            double[] x = composition(n, x1);
            for (double t : new double[] {lo, lo + 0.37 * (hi - lo), hi - 0.01, hi + 3}) {
                double tf = FahrenheitCards.fahrenheit(t);
                String at = name + " at x1 = " + x1 + ", " + t + " °C";
                assertEquals(CardFunctions.inside(c, x, t), CardFunctions.inside(f, x, tf), at);
                if (c.excessVolume() != null) {
                    same(relative, CardFunctions.density(c, x, t, ALLOW), CardFunctions.density(f, x, tf, ALLOW), at);
                    same(relative, CardFunctions.excessMolarVolume(c, x, t, ALLOW),
                            CardFunctions.excessMolarVolume(f, x, tf, ALLOW), at);
                    for (int k = 0; k < n; k++) {
                        same(relative, CardFunctions.partialMolarVolume(c, k, x, t, ALLOW),
                                CardFunctions.partialMolarVolume(f, k, x, tf, ALLOW), at);
                        same(relative, CardFunctions.pureDensity(c, k, t, ALLOW),
                                CardFunctions.pureDensity(f, k, tf, ALLOW), at);
                    }
                    if (c.excessVolume().covariance(0, 1) != null) {
                        same(relative, CardFunctions.uncertainty(c, "excess volume", -1, x, t, ALLOW),
                                CardFunctions.uncertainty(f, "excess volume", -1, x, tf, ALLOW), at);
                    }
                    compared++;
                }
                if (c.excessEnthalpy() != null) {
                    same(relative, CardFunctions.excessEnthalpy(c, x, t, ALLOW),
                            CardFunctions.excessEnthalpy(f, x, tf, ALLOW), at);
                    same(relative, CardFunctions.partialExcessEnthalpy(c, 0, x, t, ALLOW),
                            CardFunctions.partialExcessEnthalpy(f, 0, x, tf, ALLOW), at);
                    same(relative, CardFunctions.mixingHeat(c, x, AmountBasis.MOL, t, ALLOW),
                            CardFunctions.mixingHeat(f, x, AmountBasis.MOL, tf, ALLOW), at);
                    if (hasHeatCapacities(c)) {
                        // a rise is a difference: 1 K = 1.8 °F
                        same(relative, 1.8 * CardFunctions.adiabaticRise(c, x, AmountBasis.MOL, t, ALLOW),
                                CardFunctions.adiabaticRise(f, x, AmountBasis.MOL, tf, ALLOW), at);
                        Object[][] kelvin = CardFunctions.trace(c, x, t, PropertyKind.ENTHALPY, ALLOW);
                        Object[][] perF = CardFunctions.trace(f, x, tf, PropertyKind.ENTHALPY, ALLOW);
                        same(relative, 5.0 / 9.0 * heatCapacityRow(kelvin, "heat capacity: ", "/K]"),
                                heatCapacityRow(perF, "heat capacity: ", "/°F]"), at);
                        same(relative, 5.0 / 9.0 * heatCapacityRow(kelvin, "excess heat capacity", "/K]"),
                                heatCapacityRow(perF, "excess heat capacity", "/°F]"), at);
                    }
                    compared++;
                }
            }
        }
        assertTrue(compared >= 12, name + ": compared " + compared);
    }

    /** The committed °F card is the converter's output of the OIML card, exactly. */
    @Test
    void theCommittedFahrenheitCardIsTheOimlCardRewritten() {
        Object[][] committed = TestCards.cells("ethanol-water-oiml-fahrenheit.tsv");
        Object[][] made = FahrenheitCards.convert(TestCards.cells("ethanol-water-oiml.tsv"));
        assertEquals(made.length, committed.length);
        for (int r = 0; r < made.length; r++) {
            String label = String.valueOf(made[r][0]);
            if (label.equals("title") || label.equals("source")) {
                continue;
            }
            assertEquals(java.util.Arrays.asList(made[r]), java.util.Arrays.asList(committed[r]), "row " + (r + 1));
        }
    }

    /** x1 as given, the rest shared equally. */
    private static double[] composition(int n, double share) {
        double[] x = new double[n];
        x[0] = share;
        for (int k = 1; k < n; k++) {
            x[k] = (1 - share) / (n - 1);
        }
        return x;
    }

    private static boolean hasHeatCapacities(Card c) {
        for (org.miscela.core.model.Component k : c.components()) {
            if (k.heatCapacity() == null) {
                return false;
            }
        }
        return true;
    }

    /** The value of the first trace row whose label starts with {@code start} and ends with {@code unit}. */
    private static double heatCapacityRow(Object[][] trace, String start, String unit) {
        List<String> labels = new ArrayList<>();
        for (Object[] row : trace) {
            String label = (String) row[0];
            labels.add(label);
            if (label.startsWith(start) && label.endsWith(unit)) {
                return (Double) row[1];
            }
        }
        throw new AssertionError("no row " + start + "…" + unit + " in " + labels);
    }

    private static void same(double relative, double expected, double actual, String at) {
        assertEquals(expected, actual, relative * Math.max(1.0, Math.abs(expected)), at);
    }

    /** A refusal stays the same refusal, with the limits in the card's own unit. */
    @Test
    void refusalsSpeakFahrenheit() {
        Card f = CardReader.read(FahrenheitCards.convert(TestCards.cells("ethanol-water-oiml.tsv")));
        MiscelaException e = org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> CardFunctions.density(f, 0.3, 113, Extrapolation.AS_CARD));
        assertEquals("The temperature 113 °F is outside the card's validity range 32 to 104 °F.", e.getMessage()
                .substring(0, e.getMessage().indexOf("°F.") + 3));
    }
}
