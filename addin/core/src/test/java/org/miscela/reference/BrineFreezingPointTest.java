package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardEdits;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.library.CardLibrary;
import org.miscela.core.functions.PhaseFunctions;
import org.miscela.core.functions.PhaseFunctions.Activity;
import org.miscela.core.model.PitzerOsmotic;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * The freezing point of brines (ice from aqueous NaCl, KCl, CaCl2 and MgCl2) by Pitzer's osmotic coefficient, on the
 * library's cards, against outside data. The cards carry the low-temperature parameters of the FREZCHEM model (Spencer,
 * Møller and Weare 1990; Marion and co-workers) in the form of Toner and Sletten 2013, as transcribed in the PHREEQC
 * database file frezchem.dat (data/library/pitzer-frezchem.tsv); ice as on the other freezing cards (ΔH_fus 6010 J/mol,
 * CRC; ΔCp 38.25 J/(mol·K), partly from memory). Measured freezing points: reference/brine-freezing.tsv (the CRC
 * Handbook's "Concentrative Properties of Aqueous Solutions" and, for MgCl2, Lange's Handbook, Table 5.13; sources
 * named in the file).
 */
class BrineFreezingPointTest {
    private static final Card NACL = CardLibrary.find("NaCl").card();

    /** Mole fractions (salt, water) of a mass percentage of the salt, with the card's molar masses. */
    private static double[] fromMassPercent(Card c, double w) {
        double n1 = w / c.components().get(0).molarMass();
        double n2 = (100 - w) / c.components().get(1).molarMass();
        return new double[] {n1 / (n1 + n2), n2 / (n1 + n2)};
    }

    private static double depression(Card c, double w, Activity a) {
        return -PhaseFunctions.freezingPoint(c, -1, fromMassPercent(c, w), a, Extrapolation.AS_CARD);
    }

    /**
     * A_φ from the Chebyshev series of Clegg, Rard and Pitzer 1994, against the values of K. S. Pitzer,
     * Activity Coefficients in Electrolyte Solutions, 2nd ed. (1991), ch. 3, 0.3915 at 25 °C, and of K. S. Pitzer,
     * J. C. Peiper, R. H. Busey, J. Phys. Chem. Ref. Data 13 (1984) 1, 0.3767 at 0 °C (both as transcribed in the
     * pytzer and IDAES repositories): within 0.1 %.
     */
    @Test
    void debyeHuckelSlope() {
        double at25 = PitzerOsmotic.debyeHuckel(298.15);
        double at0 = PitzerOsmotic.debyeHuckel(273.15);
        assertEquals(0.3915, at25, 0.3915 * 0.001);
        assertEquals(0.3767, at0, 0.3767 * 0.001);
        Figures.note(BrineFreezingPointTest.class, "A_phi: %.5f at 25 °C (Pitzer 1991: 0.3915), %.5f at 0 °C "
                + "(Pitzer, Peiper, Busey 1984: 0.3767)", at25, at0);
    }

    /**
     * φ of NaCl from the card's parameters against the smoothed table of Pitzer, Peiper and Busey 1984 (as
     * transcribed in the IDAES repository, idaes/dmf/tests/data_files/pitzer/pitzer_9.csv), 0.1 to 6 mol/kg at 0 and
     * 25 °C; the table's 0 °C, 4 mol/kg entry (1.016) breaks its own smooth row and is left out.
     */
    @Test
    void sodiumChlorideOsmoticCoefficient() {
        PitzerOsmotic o = NACL.osmotic();
        double[] m = {0.1, 0.25, 0.5, 0.75, 1.0, 2.0, 3.0, 5.0, 6.0};
        double[] at0 = {0.932, 0.918, 0.912, 0.913, 0.917, 0.951, 1.005, 1.16, 1.258};
        double[] at25 = {0.933, 0.922, 0.922, 0.928, 0.935, 0.984, 1.045, 1.19, 1.27};
        double worst = 0;
        for (int i = 0; i < m.length; i++) {
            worst = Math.max(worst, Math.abs(o.osmoticCoefficient(m[i], 273.15) - at0[i]));
            worst = Math.max(worst, Math.abs(o.osmoticCoefficient(m[i], 298.15) - at25[i]));
        }
        assertTrue(worst < 0.006, "worst |Δφ| " + worst);
        Figures.note(BrineFreezingPointTest.class, "NaCl phi against Pitzer, Peiper, Busey 1984, 0 and 25 °C, "
                + "0.1 to 6 mol/kg: worst |Δφ| %.4f", worst);
    }

    /**
     * Every card against every point of reference/brine-freezing.tsv up to the strength given, with the ideal solution
     * of the ions beside it; the bounds are the largest deviations measured when this test was written, rounded up,
     * and the library's index states them. NaCl (CRC, 0.1 to 23 %): 0.29 K, the computed point a little too cold from
     * 6 %; the ideal solution of the ions 3.35 K too warm at 23 %. KCl (CRC, to 13 %): 0.03 K; MgCl2 (CRC, to 5 %): 0.06 K.
     * MgCl2 (Lange, 5 to 16 %): 0.33 K; nearer its eutectic the computed depression runs ahead (1.3 K at 20 %, 3.1 K
     * at 22 %). CaCl2 (CRC, to 22 %): 0.38 K; above 22 % the computed
     * depression runs ahead of the table's (3.6 K at 28 %), and from 30 % the freezing point lies below −39 °C, where the
     * Debye–Hückel series of A_φ ends, so it is refused.
     */
    @Test
    void librariesBrinesAgainstPublishedFreezingPoints() {
        compare("sodium chloride", "CRC", 23, 0.29, 3.3);
        compare("potassium chloride", "CRC", 13, 0.03, 0.5);
        compare("magnesium chloride", "CRC", 5, 0.06, 0.1);
        compare("magnesium chloride", "Lange", 16, 0.33, 5);
        compare("calcium chloride", "CRC", 22, 0.38, 8);
        // MgCl2 near its eutectic (Lange, 22 %: 32.8 K): the computed depression 3.1 K larger
        double mg22 = depression(CardLibrary.find("magnesium chloride").card(), 22, Activity.CARD) - 32.8;
        assertTrue(mg22 > 2.5 && mg22 < 3.5, "MgCl2 22 %: " + mg22);
        // above 22 % CaCl2: the computed depression is larger than the table's, increasingly
        Card cacl2 = CardLibrary.find("calcium chloride").card();
        double at28 = depression(cacl2, 28, Activity.CARD) - 34.7;
        assertTrue(at28 > 2.5 && at28 < 4, "CaCl2 28 %: " + at28);
        // 30 % (the table: 41.0 K) would freeze below −39 °C, where the Debye–Hückel series ends: refused
        MiscelaException below = assertThrows(MiscelaException.class, () -> depression(cacl2, 30, Activity.CARD));
        assertEquals(Problem.NO_FREEZING_POINT, below.problem());
        Figures.note(BrineFreezingPointTest.class, "CaCl2 28 %%: computed − CRC %+.3f K; 30 %%: %s", at28,
                below.getMessage());
    }

    /**
     * Compares one card with the rows of one source up to {@code maxPercent}: every deviation within {@code bound} K,
     * and the ideal solution of the ions off by more than {@code idealAtLeast} K somewhere (so the card's activity
     * matters there).
     */
    private static void compare(String key, String source, double maxPercent, double bound, double idealAtLeast) {
        Card c = CardLibrary.find(key).card();
        StringBuilder table = new StringBuilder();
        double worst = 0;
        double worstIdeal = 0;
        int points = 0;
        for (String[] r : LibraryCardsTest.rows("/reference/brine-freezing.tsv")) {
            if (r[0].equals("key") || !r[0].equals(key) || !r[3].equals(source)) {
                continue;
            }
            double w = Double.parseDouble(r[1]);
            double measured = Double.parseDouble(r[2]);
            if (w > maxPercent) {
                continue;
            }
            double act = depression(c, w, Activity.CARD);
            double ideal = depression(c, w, Activity.IDEAL);
            worst = Math.max(worst, Math.abs(act - measured));
            worstIdeal = Math.max(worstIdeal, Math.abs(ideal - measured));
            points++;
            table.append(String.format("%n  %4.1f %% w/w: %s %.2f K; Pitzer %.3f (%+.3f); ideal ions %.3f (%+.3f)",
                    w, source, measured, act, act - measured, ideal, ideal - measured));
        }
        Figures.note(BrineFreezingPointTest.class, "%s against %s, %d points, depressions (computed − measured): "
                + "worst %.3f K with Pitzer, %.3f K ideal:%s", key, source, points, worst, worstIdeal, table);
        assertTrue(points >= 5, key + ": " + points + " points");
        assertTrue(worst <= bound, key + " against " + source + ": worst " + worst);
        assertTrue(worstIdeal >= idealAtLeast, key + ": the ideal solution of the ions is off by only " + worstIdeal);
    }

    /**
     * The same brine with its components in the other order (water first) freezes at the same temperature; and the
     * ideal solution of the ions is the solid line solved with the water's share among water and ions, found here by
     * bisection independently of the add-in's solver: NaCl at 10 % w/w.
     */
    @Test
    void componentOrderAndTheIdealSolutionOfTheIons() {
        Card flipped = CardReader.read(CardEdits.apply(TestCards.cells("library:NaCl"),
                "set 11 = component | water | 18.015; set 12 = component | sodium chloride | 58.440; "
                        + "set 13 = component order | water | sodium chloride"));
        double[] x = fromMassPercent(NACL, 10);
        double t = PhaseFunctions.freezingPoint(NACL, -1, x, Activity.CARD, Extrapolation.AS_CARD);
        assertEquals(t, PhaseFunctions.freezingPoint(flipped, -1, new double[] {x[1], x[0]}, Activity.CARD,
                Extrapolation.AS_CARD), 1e-9);
        double share = x[1] / (x[1] + 2 * x[0]);
        double lo = 250;
        double hi = 273.15;
        for (int i = 0; i < 100; i++) {
            double mid = 0.5 * (lo + hi);
            double r = 273.15 / mid;
            double line = (-6010 * (1 / mid - 1 / 273.15) + 38.25 * (r - 1 - Math.log(r))) / PhaseFunctions.GAS_CONSTANT;
            if (Math.log(share) > line) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        assertEquals(lo - 273.15, PhaseFunctions.freezingPoint(NACL, -1, x, Activity.IDEAL, Extrapolation.AS_CARD),
                1e-8);
    }

    /**
     * Without its own temperature range the osmotic row holds within the card's: at −6.6 °C the library card's 0 °C
     * start then refuses the freezing point unless extrapolation is allowed.
     */
    @Test
    void anOsmoticRowWithoutARangeTakesTheCards() {
        Card noRange = CardReader.read(CardEdits.apply(TestCards.cells("library:NaCl"),
                "set 17 = osmotic coefficient | sodium chloride | Pitzer | 1 | 1"));
        double[] x = fromMassPercent(NACL, 10);
        assertEquals(Problem.OUTSIDE_TEMPERATURE, assertThrows(MiscelaException.class,
                () -> PhaseFunctions.freezingPoint(noRange, -1, x, Activity.CARD, Extrapolation.AS_CARD)).problem());
        assertEquals(PhaseFunctions.freezingPoint(NACL, -1, x, Activity.CARD, Extrapolation.AS_CARD),
                PhaseFunctions.freezingPoint(noRange, -1, x, Activity.CARD, Extrapolation.ALLOW), 1e-12);
    }

    /**
     * Refusals: the salt's own solid is not computed; a point below the osmotic row's range (−60 °C) is refused
     * unless extrapolation is allowed; without the osmotic row the ideal solution would count NaCl as one molecule.
     */
    @Test
    void refusals() {
        double[] x = fromMassPercent(NACL, 10);
        MiscelaException salt = assertThrows(MiscelaException.class,
                () -> PhaseFunctions.freezingPoint(NACL, 0, x, Activity.CARD, Extrapolation.AS_CARD));
        assertEquals(Problem.NO_FUSION_DATA, salt.problem());
        // inside the osmotic row's range although below the card's 0 °C (its densities): answered
        assertTrue(PhaseFunctions.freezingPoint(NACL, -1, x, Activity.CARD, Extrapolation.AS_CARD) < -6);
        Card withSaltMelting = CardReader.read(CardEdits.apply(TestCards.cells("library:NaCl"),
                "add melting point | sodium chloride | 801; add enthalpy of fusion | sodium chloride | 28.16"));
        MiscelaException solid = assertThrows(MiscelaException.class,
                () -> PhaseFunctions.freezingPoint(withSaltMelting, 0, x, Activity.CARD, Extrapolation.AS_CARD));
        assertEquals(Problem.SOLUTE_ACTIVITY, solid.problem());
        Card noOsmotic = CardReader.read(CardEdits.apply(TestCards.cells("library:NaCl"),
                "set 17 = note; set 18 = note; set 19 = note; set 20 = note; set 21 = note"));
        MiscelaException ideal = assertThrows(MiscelaException.class,
                () -> PhaseFunctions.freezingPoint(noOsmotic, -1, x, Activity.IDEAL, Extrapolation.AS_CARD));
        assertEquals(Problem.IDEAL_NEEDS_IONS, ideal.problem());
        // past the card's ice limit (NaCl: the eutectic, 23.3 % w/w, Lange's Handbook) the salt's hydrate forms first
        MiscelaException past = assertThrows(MiscelaException.class, () -> depression(NACL, 24, Activity.CARD));
        assertEquals(Problem.PAST_ICE_LIMIT, past.problem());
        assertEquals(Problem.PAST_ICE_LIMIT, assertThrows(MiscelaException.class,
                () -> depression(NACL, 24, Activity.IDEAL)).problem());
        assertTrue(depression(NACL, 23.29, Activity.CARD) > 20.9);
        // the trace at −70 °C lies below the osmotic row's −60 °C: refused, quoting the row's range
        MiscelaException cold = assertThrows(MiscelaException.class,
                () -> org.miscela.core.functions.CardFunctions.trace(NACL, new double[] {0.05, 0.95}, -70,
                        org.miscela.core.functions.PropertyKind.FREEZING, Extrapolation.AS_CARD));
        assertEquals(Problem.OUTSIDE_TEMPERATURE, cold.problem());
        assertTrue(cold.getMessage().contains("-60 to 25"), cold.getMessage());
    }
}
