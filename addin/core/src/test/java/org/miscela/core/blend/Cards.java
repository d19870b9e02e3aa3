package org.miscela.core.blend;

import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.TestCards;

/** The test cards the blending tests use, read once. */
final class Cards {
    /** Ethanol (1) + water (2) fitted to the OIML R 22 formula, 0–40 °C. */
    static final Card ETHANOL_WATER = TestCards.card("ethanol-water-oiml.tsv");
    /** Sodium chloride (1) + water (2) fitted to the CRC / Rogers–Pitzer table, 0–40 °C, up to 5 mol/kg. */
    static final Card SODIUM_CHLORIDE = TestCards.card("sodium-chloride-water-crc.tsv");
    /** Sulfuric acid (1) + water (2) fitted to the CRC table at 20 °C, up to 70 %. */
    static final Card SULFURIC_ACID = TestCards.card("sulfuric-acid-water-crc.tsv");
    /** Invented values: three solvents A, B, C, 5–45 °C. */
    static final Card TERNARY = TestCards.card("invented-ternary.tsv");
    /** Invented values: a pair with equal pure densities and a strongly negative V^E, so ρ has a maximum. */
    static final Card DENSITY_MAXIMUM = TestCards.card("invented-density-maximum.tsv");

    /** Invented values: R is lighter than air (1.1 kg/m³), so its conventional mass cannot be converted. */
    static final Card LIGHTER_THAN_AIR = TestCards.card("invented-lighter-than-air.tsv");

    /** Invented values: three constant-density liquids; C's mole fraction must be at least 0.1. */
    static final Card LIMITED_TERNARY = CardReader.read(new Object[][] {{"Miscela card", 1.0},
        {"source", "invented values, for tests"}, {"temperature unit", "°C"}, {"density unit", "kg/m³"},
        {"molar volume unit", "cm³/mol"}, {"molar mass unit", "g/mol"}, {"valid temperature", 10.0, 30.0},
        {"component", "A", 50.0}, {"component", "B", 20.0}, {"component", "C", 80.0},
        {"density model", "A", "constant"}, {"density coefficients", "A", 800.0}, {"density model", "B", "constant"},
        {"density coefficients", "B", 1000.0}, {"density model", "C", "constant"},
        {"density coefficients", "C", 1200.0}, {"valid mole fraction", "C", 0.1, 1.0},
        {"excess volume A0", "A + B", -1.0}, {"excess volume A0", "A + C", 0.0}, {"excess volume A0", "B + C", 0.0}});

    /**
     * Largest |ρ_card − ρ_OIML| over p = 0..1, t = 0..40 °C, as established by EthanolWaterCardTest: 0.011 kg/m³
     * (the fit reaches 0.0104).
     */
    static final double OIML_DENSITY_TOLERANCE = 0.011;
    /** Half a unit of the last digit of the OIML check values in ethanol-water.md (three decimals), kg/m³. */
    static final double OIML_ROUNDING = 0.0005;

    private Cards() {
    }
}
