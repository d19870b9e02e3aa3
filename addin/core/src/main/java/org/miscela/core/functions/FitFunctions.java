package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Units;
import org.miscela.core.model.Component;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.List;
import org.miscela.core.fit.DeviationMeasure;
import org.miscela.core.fit.LeastSquaresFit;
import org.miscela.core.fit.LinearLeastSquares;
import org.miscela.core.fit.OrderSelection;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;
import org.miscela.core.fit.VleFit;
import org.miscela.core.fit.VleFitter;
import org.miscela.core.model.VapourPressure;

/**
 * The fit cell functions' arithmetic: Redlich–Kister coefficients from lab data, in the units of the data or of a
 * card, shaped so an array formula can fill a card's coefficient cells; and general linear least squares. Each
 * returns the requested {@link FitOutput} as a table of cells (numbers and text; never NaN).
 */
public final class FitFunctions {
    /** Significance level of the order-selection F-tests (common practice). */
    static final double SIGNIFICANCE = 0.05;

    private FitFunctions() {
    }

    /**
     * Fit of (x1, V^E) data, with temperature dependence when {@code orderInT} &gt; 0. Coefficients come out in the
     * unit of the excess volumes given, per unit of temperature difference; nothing else is converted.
     *
     * @param temperatures one per point, or null when {@code orderInT} is 0
     * @param reference the reference temperature, in the unit of {@code temperatures} (NaN when orderInT is 0)
     * @param weights one per point, or null
     */
    public static Object[][] excess(double[] x1, double[] excess, int orderInX, double[] temperatures, int orderInT,
            double reference, double[] weights, FitOutput output) {
        if (output == FitOutput.CHECK) {
            excess(x1, excess, orderInX, temperatures, orderInT, reference, weights, FitOutput.COEFFICIENTS);
            return new Object[][] {{CardFunctions.OK}};
        }
        if (output == FitOutput.CONSISTENCY) {
            throw Problem.FIT_OUTPUT_NOT_HERE.raise(output.word());
        }
        double[] tau = offsets(x1.length, temperatures, orderInT, reference);
        if (output == FitOutput.ORDERS) {
            return orders(OrderSelection.compare(orderInX, m -> RedlichKisterFitter.excessVolumesAtOffsets(x1, tau,
                    excess, m, orderInT, weights).leastSquares(), SIGNIFICANCE), "");
        }
        RedlichKisterFit fit = RedlichKisterFitter.excessVolumesAtOffsets(x1, tau, excess, orderInX, orderInT,
                weights);
        return rkOutput(fit, output, 1.0, Units.Temperature.KELVIN, fit.leastSquares().residuals(), 1.0, "",
                "excess volumes");
    }

    /**
     * Fit of (x, T, ρ) data for the pair {@code first} + {@code second} of a card's components (x the mole fraction
     * of {@code first} in the binary), minimising deviations in density. Everything is in the card's units:
     * temperatures, densities, and the coefficients in its molar volume unit per unit of temperature difference.
     *
     * @param pure a card holding at least the two components' molar masses and densities
     */
    public static Object[][] density(Card pure, int first, int second, double[] x1, double[] density,
            double[] temperatures, int orderInX, int orderInT, double reference, double[] weights, FitOutput output) {
        if (output == FitOutput.CHECK) {
            density(pure, first, second, x1, density, temperatures, orderInX, orderInT, reference, weights,
                    FitOutput.COEFFICIENTS);
            return new Object[][] {{CardFunctions.OK}};
        }
        if (output == FitOutput.CONSISTENCY) {
            throw Problem.FIT_OUTPUT_NOT_HERE.raise(output.word());
        }
        Units u = pure.units();
        if (pure.densityModel() != null) {
            throw Problem.FIT_PURE_FROM_MODEL.raise(pure.densityModel().modelName());
        }
        if (orderInT > 0 && Double.isNaN(reference)) {
            throw Problem.FIT_NEEDS_REFERENCE.raise();
        }
        int n = x1.length;
        double[] kelvin = new double[n];
        double[] rho = new double[n];
        for (int i = 0; i < n; i++) {
            kelvin[i] = u.temperature().toKelvin(temperatures[i]);
            rho[i] = u.density().toKgPerM3(density[i]);
            for (int k : new int[] {first, second}) {
                double pureRho = pure.components().get(k).density().at(kelvin[i]);
                if (!(pureRho > 0) || Double.isInfinite(pureRho)) {
                    throw Problem.NON_PHYSICAL.raise(Numbers.show(temperatures[i]), u.temperature().symbol(),
                            "density of " + pure.components().get(k).name(), Numbers.show(pureRho));
                }
            }
        }
        double refK = orderInT > 0 ? u.temperature().toKelvin(reference) : kelvin.length > 0 ? kelvin[0] : 298.15;
        Component a = pure.components().get(first);
        Component b = pure.components().get(second);
        String densityUnit = u.density().symbol();
        if (output == FitOutput.ORDERS) {
            return orders(OrderSelection.compare(orderInX, m -> RedlichKisterFitter.densities(x1, kelvin, rho, a, b,
                    m, orderInT, refK, DeviationMeasure.DENSITY, weights).leastSquares(), SIGNIFICANCE),
                    " [" + densityUnit + "]", u.density().fromKgPerM3(1.0));
        }
        RedlichKisterFit fit = RedlichKisterFitter.densities(x1, kelvin, rho, a, b, orderInX, orderInT, refK,
                DeviationMeasure.DENSITY, weights);
        // Density residuals from the fitted expansion, in the card's density unit.
        RedlichKister rk = fit.toRedlichKister();
        double[] residuals = new double[n];
        for (int i = 0; i < n; i++) {
            double vm = x1[i] * a.molarVolume(kelvin[i]) + (1 - x1[i]) * b.molarVolume(kelvin[i])
                    + rk.value(x1[i], kelvin[i]);
            double m = x1[i] * a.molarMass() + (1 - x1[i]) * b.molarMass();
            residuals[i] = u.density().fromKgPerM3(rho[i] - 1000.0 * m / vm);
        }
        double volumeScale = 1.0 / u.molarVolume().toCm3PerMol(1.0);
        if (output == FitOutput.STATISTICS) {
            // The least squares run on weighted excess volumes; their largest raw residual is a volume, so the
            // largest deviation is taken from the density residuals, like the standard deviation beside it.
            int worst = -1;
            for (int i = 0; i < n; i++) {
                if ((weights == null || weights[i] > 0)
                        && (worst < 0 || Math.abs(residuals[i]) > Math.abs(residuals[worst]))) {
                    worst = i;
                }
            }
            return statistics(fit.leastSquares(), u.density().fromKgPerM3(1.0), " [" + densityUnit + "]",
                    "densities (deviations in density)", residuals[worst], worst);
        }
        return rkOutput(fit, output, volumeScale, u.temperature(), residuals, u.density().fromKgPerM3(1.0),
                " [" + densityUnit + "]", "densities (deviations in density)");
    }

    /** The Redlich–Kister order of a vapour–liquid fit whose order is left out. */
    public static final int DEFAULT_VLE_ORDER = 2;
    /**
     * The root-mean-square relative pressure deviation above which a vapour–liquid fit's coefficients are refused:
     * 10 %, several times what a usable model misses good data by (under 1 % for ethanol + water, VleFitTest), and
     * what a slip of units or columns produces.
     */
    static final double POOR_VLE_FIT = 0.10;
    /**
     * NRTL's α when left out: 0.3, the value most often chosen (common practice; Renon and Prausnitz 1968 give 0.2
     * to 0.47).
     */
    public static final double DEFAULT_NRTL_ALPHA = 0.3;

    /**
     * G^E/RT of the pair {@code first} + {@code second} fitted to vapour–liquid equilibrium data (see
     * {@link VleFitter}), everything in the card's units: x and y the mole fractions of {@code first}, temperatures in
     * its temperature unit, pressures in its pressure unit. The coefficients come out shaped as the card's rows take
     * them: Redlich–Kister a_kj (one row per A_k, per degree^j of the card's scale), or the values after the pair of
     * a 'Wilson' row (Δλ/R in K, or a, b, c of each) or of an 'NRTL' row (A, B (K), A, B, α).
     *
     * @param pure a card holding the two components' vapour pressures (and, for Wilson, their 'Wilson volume' rows)
     * @param y the vapour mole fractions, or null for Barker's method
     * @param orderInX the Redlich–Kister order, or −1 when left out
     */
    public static Object[][] vle(Card pure, int first, int second, double[] x, double[] y, double[] temperatures,
            double[] pressures, VleFitter.Model model, int orderInX, int orderInT, double reference, double alpha,
            double[] weights, FitOutput output) {
        if (output == FitOutput.CHECK) {
            vle(pure, first, second, x, y, temperatures, pressures, model, orderInX, orderInT, reference, alpha,
                    weights, FitOutput.COEFFICIENTS);
            return new Object[][] {{CardFunctions.OK}};
        }
        if (output == FitOutput.ORDERS) {
            throw Problem.FIT_OUTPUT_NOT_HERE.raise(output.word());
        }
        if (model != VleFitter.Model.REDLICH_KISTER && orderInX >= 0) {
            throw Problem.FIT_ORDER_NOT_HERE.raise(model.word());
        }
        if (model != VleFitter.Model.REDLICH_KISTER && orderInT > 1) {
            throw Problem.NOT_A_COUNT.raise("order in T of " + model.word(), 1, Numbers.show(orderInT));
        }
        int m = model == VleFitter.Model.REDLICH_KISTER ? (orderInX < 0 ? DEFAULT_VLE_ORDER : orderInX) : 0;
        Units u = pure.units();
        Units.Pressure pu = pure.pressureUnit();
        if (pu == null) {
            throw Problem.NO_PRESSURE_UNIT.raise();
        }
        Units.Temperature tu = u.temperature();
        int n = x.length;
        double[] kelvin = new double[n];
        double[] pascal = new double[n];
        int[] pair = {first, second};
        for (int i = 0; i < n; i++) {
            kelvin[i] = tu.toKelvin(temperatures[i]);
            pascal[i] = pu.toPascal(pressures[i]);
            for (int k : pair) {
                VapourPressure vp = pure.vapourPressure(k);
                String name = pure.components().get(k).name();
                if (vp == null) {
                    throw Problem.NO_VAPOUR_PRESSURE.raise(name);
                }
                if (kelvin[i] < vp.lowestKelvin() || kelvin[i] > vp.highestKelvin()) {
                    throw Problem.FIT_OUTSIDE_VAPOUR_PRESSURE.raise(i + 1, Numbers.show(temperatures[i]), tu.symbol(),
                            Numbers.show(tu.fromKelvin(vp.lowestKelvin())), Numbers.show(tu.fromKelvin(
                                    vp.highestKelvin())), tu.symbol(), name);
                }
            }
        }
        double[] volumes = null;
        if (model == VleFitter.Model.WILSON) {
            volumes = new double[2];
            for (int j = 0; j < 2; j++) {
                volumes[j] = pure.wilsonVolume(pair[j]);
                if (Double.isNaN(volumes[j])) {
                    throw Problem.FIT_NEEDS_WILSON_VOLUMES.raise(pure.components().get(pair[j]).name());
                }
            }
        }
        if (model == VleFitter.Model.REDLICH_KISTER && orderInT > 0 && Double.isNaN(reference)) {
            throw Problem.FIT_NEEDS_REFERENCE.raise();
        }
        double refK = orderInT > 0 && model == VleFitter.Model.REDLICH_KISTER ? tu.toKelvin(reference) : 298.15;
        VleFitter fitter = new VleFitter(model, m, orderInT, refK, alpha, volumes, pure.vapourPressure(first),
                pure.vapourPressure(second), x, y, kelvin, pascal, weights);
        if (output == FitOutput.CONSISTENCY) {
            return consistency(fitter);
        }
        VleFit fit = fitter.fit();
        double[] rel = fit.relativePressureDeviation();
        if (rel[0] > POOR_VLE_FIT && output != FitOutput.STATISTICS && output != FitOutput.RESIDUALS) {
            throw Problem.VLE_FIT_POOR.raise(Numbers.show(100 * rel[0]), Numbers.show(100 * rel[1]),
                    (int) rel[2] + 1);
        }
        switch (output) {
            case COEFFICIENTS:
                return vleShape(fit, fit.parameters(), tu, false);
            case STANDARD_ERRORS:
                return vleShape(fit, fit.standardErrors(), tu, true);
            case COVARIANCE: {
                double[][] c = fit.covariance();
                if (model == VleFitter.Model.REDLICH_KISTER) {
                    int terms = orderInT + 1;
                    for (int p = 0; p < c.length; p++) {
                        for (int q = 0; q < c.length; q++) {
                            c[p][q] = tu.fromPerKelvin(c[p][q], p % terms + q % terms);
                        }
                    }
                }
                return matrix(c, 1.0);
            }
            case RESIDUALS: {
                double[] dp = fit.pressureDeviations();
                double[] dy = fit.vapourDeviations();
                Object[][] out = new Object[n][2];
                for (int i = 0; i < n; i++) {
                    out[i][0] = orBlank(pu.fromPascal(dp[i]));
                    out[i][1] = orBlank(dy[i]);
                }
                return out;
            }
            default:
                return vleStatistics(fit, pure, pair, volumes, u);
        }
    }

    /** The parameters as the card's row takes them; standard errors leave the fixed entries blank. */
    private static Object[][] vleShape(VleFit fit, double[] v, Units.Temperature tu, boolean errors) {
        int mt = fit.orderInT();
        switch (fit.model()) {
            case REDLICH_KISTER: {
                Object[][] out = new Object[fit.orderInX() + 1][mt + 1];
                for (int k = 0; k <= fit.orderInX(); k++) {
                    for (int j = 0; j <= mt; j++) {
                        out[k][j] = orBlank(tu.fromPerKelvin(v[k * (mt + 1) + j], j));
                    }
                }
                return out;
            }
            case WILSON:
                return mt == 0 ? new Object[][] {{orBlank(v[0]), orBlank(v[1])}}
                        : new Object[][] {{orBlank(v[0]), orBlank(v[1]), errors ? "" : (Object) 0.0, orBlank(v[2]),
                            orBlank(v[3]), errors ? "" : (Object) 0.0}};
            default: {
                Object fixedA = errors ? "" : (Object) 0.0;
                Object alpha = errors ? "" : (Object) fit.alpha();
                return mt == 0 ? new Object[][] {{fixedA, orBlank(v[0]), fixedA, orBlank(v[1]), alpha}}
                        : new Object[][] {{orBlank(v[0]), orBlank(v[1]), orBlank(v[2]), orBlank(v[3]), alpha}};
            }
        }
    }

    private static Object[][] vleStatistics(VleFit fit, Card pure, int[] pair, double[] volumes, Units u) {
        List<Object[]> rows = new ArrayList<>();
        rows.add(new Object[] {"fitted to", fit.withVapour() ? "p and y"
                : "p alone (Barker's method)"});
        rows.add(new Object[] {"model", fit.model().word()});
        rows.add(new Object[] {"points", (double) fit.points()});
        rows.add(new Object[] {"parameters", (double) fit.parameters().length});
        rows.add(new Object[] {"degrees of freedom", (double) fit.degreesOfFreedom()});
        rows.add(new Object[] {"standard deviation (relative p and y)", fit.degreesOfFreedom() > 0
                ? (Object) fit.standardDeviation() : "none: as many residuals as parameters"});
        double[] p = fit.relativePressureDeviation();
        rows.add(new Object[] {"root mean square of p_calc/p − 1", p[0]});
        rows.add(new Object[] {"largest |p_calc/p − 1|", p[1]});
        rows.add(new Object[] {"at point", p[2] + 1});
        double[] y = fit.vapourDeviation();
        if (y != null) {
            rows.add(new Object[] {"mean |y_calc − y|", y[0]});
            rows.add(new Object[] {"largest |y_calc − y|", y[1]});
            rows.add(new Object[] {"at point", y[2] + 1});
        }
        if (volumes != null) {
            for (int j = 0; j < 2; j++) {
                rows.add(new Object[] {"Wilson volume of " + pure.components().get(pair[j]).name() + " ["
                        + u.molarVolume().symbol() + "]", u.molarVolume().fromCm3PerMol(volumes[j])});
            }
        }
        if (fit.model() == VleFitter.Model.NRTL) {
            rows.add(new Object[] {"α (fixed)", fit.alpha()});
        }
        rows.add(new Object[] {"iterations", (double) fit.iterations()});
        return rows.toArray(new Object[0][]);
    }

    private static Object[][] consistency(VleFitter fitter) {
        double[] point = fitter.pointTest();
        double[] area = fitter.areaTest();
        List<Object[]> rows = new ArrayList<>();
        rows.add(new Object[] {"point test (Van Ness et al. 1973): fit to p, compare y", ""});
        rows.add(new Object[] {"mean |y_calc − y|", point[0]});
        rows.add(new Object[] {"largest |y_calc − y|", point[1]});
        rows.add(new Object[] {"at point", point[2] + 1});
        rows.add(new Object[] {"point test: mean below " + VleFitter.POINT_TEST_LIMIT
                + " (Fredenslund et al. 1977)", point[0] < VleFitter.POINT_TEST_LIMIT ? "passes" : "fails"});
        rows.add(new Object[] {"area test (Redlich–Kister 1948, Herington 1951)", ""});
        rows.add(new Object[] {"A = ∫ ln(γ1/γ2) dx1 above 0", area[0]});
        rows.add(new Object[] {"B = −∫ ln(γ1/γ2) dx1 below 0", area[1]});
        rows.add(new Object[] {"D = 100·|A − B|/(A + B)", area[2]});
        rows.add(new Object[] {"J = 150·(T_max − T_min)/T_min", area[3]});
        rows.add(new Object[] {"area test: D − J below " + (int) VleFitter.AREA_TEST_LIMIT,
            area[2] - area[3] < VleFitter.AREA_TEST_LIMIT ? "passes" : "fails"});
        rows.add(new Object[] {"note", "the area test ignores p: the point test is stronger"});
        return rows.toArray(new Object[0][]);
    }

    /** General weighted linear least squares: y ≈ X·b. The orders output does not apply. */
    public static Object[][] leastSquares(double[][] design, double[] response, double[] weights, FitOutput output) {
        LeastSquaresFit fit = LinearLeastSquares.fit(design, response, weights);
        switch (output) {
            case COEFFICIENTS:
                return column(fit.coefficients());
            case STANDARD_ERRORS:
                return column(fit.standardErrors());
            case COVARIANCE:
                return matrix(fit.covariance(), 1.0);
            case RESIDUALS:
                return column(fit.residuals());
            case STATISTICS:
                return statistics(fit, 1.0, "", "the response");
            case CHECK:
                return new Object[][] {{CardFunctions.OK}};
            default:
                throw Problem.FIT_OUTPUT_NOT_HERE.raise(output.word());
        }
    }

    /**
     * One output of a Redlich–Kister fit whose coefficients are per K^j: volumes scaled by {@code volumeScale}, and
     * each coefficient a_kj made per degree^j of {@code scale} (the temperature scale of the card, for a density fit;
     * kelvin, which changes nothing, for a fit in the data's own units).
     */
    private static Object[][] rkOutput(RedlichKisterFit fit, FitOutput output, double volumeScale,
            Units.Temperature scale, double[] residuals, double deviationScale, String deviationUnit,
            String fittedTo) {
        switch (output) {
            case COEFFICIENTS:
                return matrix(perDegree(fit.coefficients(), scale), volumeScale);
            case STANDARD_ERRORS:
                return matrix(perDegree(fit.standardErrors(), scale), volumeScale);
            case COVARIANCE: {
                double[][] c = fit.leastSquares().covariance();
                int terms = fit.orderInT() + 1;
                double[][] out = new double[c.length][c.length];
                for (int p = 0; p < c.length; p++) {
                    for (int q = 0; q < c.length; q++) {
                        out[p][q] = scale.fromPerKelvin(c[p][q], p % terms + q % terms);
                    }
                }
                return matrix(out, volumeScale * volumeScale);
            }
            case RESIDUALS:
                return column(residuals);
            case STATISTICS:
                return statistics(fit.leastSquares(), deviationScale, deviationUnit, fittedTo);
            default:
                throw new IllegalStateException(output.toString());
        }
    }

    private static Object[][] statistics(LeastSquaresFit fit, double deviationScale, String unit, String fittedTo) {
        return statistics(fit, deviationScale, unit, fittedTo, fit.largestResidual() * deviationScale,
                fit.largestResidualIndex());
    }

    /** The statistics table, with the largest residual (in the output's unit) and its 0-based point given. */
    private static Object[][] statistics(LeastSquaresFit fit, double deviationScale, String unit, String fittedTo,
            double largest, int worst) {
        List<Object[]> rows = new ArrayList<>();
        rows.add(new Object[] {"fitted to", fittedTo});
        rows.add(new Object[] {"points", (double) fit.pointCount()});
        rows.add(new Object[] {"parameters", (double) fit.parameterCount()});
        rows.add(new Object[] {"degrees of freedom", (double) fit.degreesOfFreedom()});
        double s = fit.residualStandardDeviation();
        rows.add(new Object[] {"standard deviation of the fit" + unit,
            Double.isNaN(s) ? "none: as many parameters as points" : finiteOr(s * deviationScale, OVERFLOW)});
        rows.add(new Object[] {"largest residual" + unit, finiteOr(largest, OVERFLOW)});
        rows.add(new Object[] {"largest residual at point", (double) (worst + 1)});
        double r2 = fit.rSquared();
        // R² = 1 − RSS/TSS is undefined when the data do not vary (TSS = 0), whatever RSS rounds to.
        rows.add(new Object[] {fit.isCentred() ? "R²" : "R² (uncentred)", finiteOr(r2, "undefined")});
        rows.add(new Object[] {"condition number (scaled columns)", fit.conditionNumber()});
        return rows.toArray(new Object[0][]);
    }

    /** The statistics' text for a sum of squares beyond double range (data near ±1e308). */
    private static final String OVERFLOW = "overflow: the residuals are too large to square";

    /** The number, or the text saying why there is none: a statistics table never holds NaN or infinity. */
    private static Object finiteOr(double v, String text) {
        return Double.isFinite(v) ? (Object) v : text;
    }

    private static Object[][] orders(OrderSelection selection, String unit) {
        return orders(selection, unit, 1.0);
    }

    private static Object[][] orders(OrderSelection selection, String unit, double deviationScale) {
        List<Object[]> rows = new ArrayList<>();
        rows.add(new Object[] {"order", "parameters", "degrees of freedom", "standard deviation" + unit,
            "F against the order below", "p-value", "AIC", "BIC"});
        for (OrderSelection.Step s : selection.steps()) {
            rows.add(new Object[] {(double) s.order(), (double) s.parameterCount(), (double) s.degreesOfFreedom(),
                orBlank(s.residualStandardDeviation() * deviationScale), orBlank(s.fStatistic()), orBlank(s.pValue()),
                orBlank(s.aic()), orBlank(s.bic())});
        }
        rows.add(row8("selected order (F-test at 5 %)", (double) selection.selectedOrder()));
        rows.add(row8("lowest AIC at order", (double) selection.lowestAicOrder()));
        rows.add(row8("lowest BIC at order", (double) selection.lowestBicOrder()));
        if (selection.reachedHighestOrder()) {
            rows.add(row8("note", "every added term was significant: try a higher order"));
        }
        return rows.toArray(new Object[0][]);
    }

    private static Object[] row8(String label, Object value) {
        return new Object[] {label, value, "", "", "", "", "", ""};
    }

    private static Object orBlank(double v) {
        return Double.isNaN(v) || Double.isInfinite(v) ? "" : (Object) v;
    }

    private static double[] offsets(int n, double[] temperatures, int orderInT, double reference) {
        double[] tau = new double[n];
        if (orderInT == 0) {
            return tau;
        }
        if (temperatures == null) {
            throw Problem.FIT_NEEDS_TEMPERATURE.raise();
        }
        if (Double.isNaN(reference)) {
            throw Problem.FIT_NEEDS_REFERENCE.raise();
        }
        for (int i = 0; i < n; i++) {
            tau[i] = temperatures[i] - reference;
        }
        return tau;
    }

    /** a[k][j] per K^j as per degree^j of the scale. */
    private static double[][] perDegree(double[][] a, Units.Temperature scale) {
        double[][] out = new double[a.length][];
        for (int k = 0; k < a.length; k++) {
            out[k] = new double[a[k].length];
            for (int j = 0; j < a[k].length; j++) {
                out[k][j] = scale.fromPerKelvin(a[k][j], j);
            }
        }
        return out;
    }

    private static Object[][] column(double[] v) {
        Object[][] out = new Object[v.length][1];
        for (int i = 0; i < v.length; i++) {
            out[i][0] = orBlank(v[i]);
        }
        return out;
    }

    private static Object[][] matrix(double[][] m, double scale) {
        Object[][] out = new Object[m.length][];
        for (int i = 0; i < m.length; i++) {
            out[i] = new Object[m[i].length];
            for (int j = 0; j < m[i].length; j++) {
                out[i][j] = orBlank(m[i][j] * scale);
            }
        }
        return out;
    }
}
