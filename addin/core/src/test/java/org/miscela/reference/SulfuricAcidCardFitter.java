package org.miscela.reference;

import java.io.IOException;
import java.util.Arrays;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.model.Component;
import org.miscela.core.fit.DeviationMeasure;
import org.miscela.core.fit.OrderSelection;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;

/**
 * Writes the sulfuric acid + water density card at 20 °C (test resource cards/sulfuric-acid-water-crc.tsv):
 * Redlich–Kister coefficients fitted by the library's fit engine to the CRC densities 1–70 % ({@link CrcSulfuricAcid},
 * eight points), minimising density deviations; the pure acid's density is the table's 100 % value, 1830.5 kg/m³;
 * water by the built-in Tanaka 2001 model. The order is the fit engine's F-test verdict at the 5 % level among orders
 * 0..{@value #HIGHEST_ORDER} (the highest leaving two residual degrees of freedom).
 *
 * <p>The table has no point between 70 % and 100 %, where the real density passes a maximum (common practice, not
 * checked here), so the card's validity stops at 70 % (x = 0.30). The data are at 20 °C only: the card's temperature
 * range 19.5–20.5 °C is a tolerance for readings near 20 °C, with constant coefficients and a constant acid density.
 * Run once (argument: the output path); {@code SulfuricAcidDensityTest} checks the committed card against the table.
 */
public final class SulfuricAcidCardFitter {
    static final int HIGHEST_ORDER = 5;
    static final double SIGNIFICANCE = 0.05;
    static final int POINTS = 8;

    private SulfuricAcidCardFitter() {
    }

    static Component[] components() {
        Object[][] cells = {
            {"Miscela card", 1.0}, {"source", "components only"}, {"temperature unit", "K"},
            {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"}, {"molar mass unit", "g/mol"},
            {"valid temperature", 273.15, 313.15},
            {"component", "sulfuric acid", CrcSulfuricAcid.M_ACID}, {"component", "water", CrcSulfuricAcid.M_WATER},
            {"density model", "sulfuric acid", "constant"},
            {"density coefficients", "sulfuric acid", 1000.0 * CrcSulfuricAcid.DENSITY_G_PER_CM3[POINTS]},
            {"density model", "water", "Tanaka 2001"}, {"valid mole fraction", "sulfuric acid", 0.0, 1.0},
            {"excess volume A0", "sulfuric acid + water", 0.0}};
        Card card = CardReader.read(cells);
        return new Component[] {card.components().get(0), card.components().get(1)};
    }

    static RedlichKisterFit fit(int order) {
        double[] x = new double[POINTS];
        double[] rho = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            x[i] = CrcSulfuricAcid.moleFraction(CrcSulfuricAcid.MASS_PERCENT[i] / 100.0);
            rho[i] = 1000.0 * CrcSulfuricAcid.DENSITY_G_PER_CM3[i];
        }
        Component[] c = components();
        return RedlichKisterFitter.densities(x, rho, c[0], c[1], 293.15, order, DeviationMeasure.DENSITY, null);
    }

    static OrderSelection selection() {
        return OrderSelection.compare(HIGHEST_ORDER, m -> fit(m).leastSquares(), SIGNIFICANCE);
    }

    static String card() {
        int order = selection().selectedOrder();
        double[][] a = fit(order).coefficients();
        TsvCard b = new TsvCard()
                .row("Miscela card", "1")
                .row("title", "Sulfuric acid + water at 20 °C, densities 0-70 %")
                .row("source", "Densities: CRC Handbook, Concentrative Properties of Aqueous Solutions (public "
                        + "reproduction), H2SO4 1-70 % at 20 C; Redlich-Kister A0..A" + order + " least-squares fit to "
                        + "those densities (order by F-test at 5 %); acid: 1.8305 g/cm3, the table's 100 % value; "
                        + "water: Tanaka et al. 2001; molar masses CIAAW 2021 abridged")
                .row("note", "Data at 20 C only; the temperature range is a tolerance. Valid to 70 % (x = 0.30).")
                .row("temperature unit", "°C")
                .row("density unit", "kg/m³")
                .row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol")
                .row("component", "sulfuric acid", CrcSulfuricAcid.M_ACID)
                .row("component", "water", CrcSulfuricAcid.M_WATER)
                .row("density model", "sulfuric acid", "constant")
                .row("density coefficients", "sulfuric acid", 1000.0 * CrcSulfuricAcid.DENSITY_G_PER_CM3[POINTS])
                .row("density model", "water", "Tanaka 2001");
        for (int k = 0; k < a.length; k++) {
            b.row("excess volume A" + k, "sulfuric acid + water", a[k]);
        }
        return b.row("valid temperature", "19.5", "20.5")
                .row("valid mole fraction", "sulfuric acid", "0", CrcSulfuricAcid.moleFraction(0.70))
                .row("extrapolation", "refuse")
                .text();
    }

    public static void main(String[] args) throws IOException {
        for (OrderSelection.Step s : selection().steps()) {
            System.out.printf("order %d: s = %.4f kg/m³, F = %.3f, p = %.3f%n", s.order(),
                    s.residualStandardDeviation(), s.fStatistic(), s.pValue());
        }
        System.out.println("selected " + selection().selectedOrder() + " "
                + Arrays.toString(fit(selection().selectedOrder()).leastSquares().residuals()));
        TsvCard.write(args[0], card());
    }
}
