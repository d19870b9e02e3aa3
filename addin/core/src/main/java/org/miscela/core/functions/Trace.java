package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Mixture;
import org.miscela.core.card.Units;
import org.miscela.core.model.Component;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.ExcessModel;
import org.miscela.core.model.HeatCapacity;
import org.miscela.core.model.LocalCompositionGibbs;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import java.util.ArrayList;
import java.util.List;

/**
 * The audit trace of one evaluation: (label, value) rows holding every intermediate number, in the card's units, in
 * the order a person re-deriving the result by hand needs them. docs/trace.md documents each label; a test keeps
 * the two in step.
 */
final class Trace {
    private final List<Object[]> rows = new ArrayList<>();

    private Trace() {
    }

    static Object[][] of(Card card, double[] x, double t, double kelvin, PropertyKind property, Extrapolation e,
            List<Violation> outside) {
        Trace tr = new Trace();
        Units u = card.units();
        tr.head(card, property.word());
        ExcessFunction f = property == PropertyKind.VOLUME ? card.excessVolume() : card.excessEnthalpy();
        ExcessModel excess = property == PropertyKind.VOLUME ? card.volumeModel() : f;
        if (f != null) {
            String model = f.model().cardName();
            if (f.asymmetricComponent() >= 0) {
                model += " (asymmetric component: " + name(card, f.asymmetricComponent()) + ")";
            }
            tr.add("multicomponent model", model);
        } else {
            tr.add("mixture density model", card.densityModel().modelName());
        }
        tr.point(card, x, t, kelvin, e, outside);
        Mixture m = card.mixture();
        String mm = u.molarMass().symbol();
        for (int k = 0; k < x.length; k++) {
            Component c = card.components().get(k);
            tr.add("molar mass: " + c.name() + " [" + mm + "]", 1.0 / u.molarMass().toGramPerMol(1.0) * c.molarMass());
        }
        double scale;
        String unit;
        String symbol;
        if (property == PropertyKind.VOLUME) {
            unit = u.molarVolume().symbol();
            scale = 1.0 / u.molarVolume().toCm3PerMol(1.0);
            symbol = "V";
            for (int k = 0; k < x.length; k++) {
                Component c = card.components().get(k);
                boolean limit = card.hypotheticalPure(k);
                tr.add("pure density model: " + c.name(), limit ? c.density().modelName()
                        + " limit (no real liquid: the excess volume is measured from it)" : c.density().modelName());
                tr.add("pure density: " + c.name() + " [" + u.density().symbol() + "]",
                        u.density().fromKgPerM3(c.density().at(kelvin)));
                tr.add("pure molar volume: " + c.name() + " [" + unit + "]", scale * m.pureMolarVolume(k, kelvin));
            }
        } else {
            unit = u.enthalpy().symbol();
            scale = 1.0 / u.enthalpy().toJoulePerMol(1.0);
            symbol = "H";
        }
        String excessName = property == PropertyKind.VOLUME ? "excess molar volume" : "excess molar enthalpy";
        if (f != null) {
            tr.pairs(card, f, x, kelvin, scale, unit);
        } else {
            double mass = m.meanMolarMass(x);
            for (int k = 0; k < x.length; k++) {
                tr.add("mass fraction: " + name(card, k), x[k] * card.components().get(k).molarMass() / mass);
            }
        }
        double[] g = new double[x.length];
        double be = excess.evaluate(x, kelvin, false, g, null);
        tr.add(excessName + " [" + unit + "]", scale * be);
        double mean = 0.0;
        for (int k = 0; k < x.length; k++) {
            tr.add("derivative d" + symbol + "E/dx: " + name(card, k) + " [" + unit + "]", scale * g[k]);
            mean += x[k] * g[k];
        }
        tr.add("sum of x·d" + symbol + "E/dx [" + unit + "]", scale * mean);
        String partialName = property == PropertyKind.VOLUME ? "partial molar excess volume: "
                : "partial molar excess enthalpy: ";
        for (int k = 0; k < x.length; k++) {
            tr.add(partialName + name(card, k) + " [" + unit + "]", scale * (be + g[k] - mean));
        }
        if (property == PropertyKind.VOLUME) {
            for (int k = 0; k < x.length; k++) {
                tr.add("partial molar volume: " + name(card, k) + " [" + unit + "]",
                        scale * (m.pureMolarVolume(k, kelvin) + be + g[k] - mean));
            }
            tr.add("mixture molar volume [" + unit + "]", scale * m.molarVolume(x, kelvin));
            tr.add("mean molar mass [" + mm + "]", m.meanMolarMass(x) / u.molarMass().toGramPerMol(1.0));
            tr.add("mixture density [" + u.density().symbol() + "]",
                    u.density().fromKgPerM3(PointChecks.physicalDensity(card, x, kelvin, t)));
        } else {
            Units.Temperature scaleT = u.temperature();
            String cpUnit = u.enthalpy().symbol() + "/" + scaleT.degree();
            tr.add("excess heat capacity dHE/dT [" + cpUnit + "]",
                    scaleT.fromPerKelvin(scale * m.excessHeatCapacity(x, kelvin), 1));
            for (int k = 0; k < x.length; k++) {
                HeatCapacity c = card.components().get(k).heatCapacity();
                tr.add("heat capacity: " + name(card, k) + " [" + cpUnit + "]",
                        c == null ? "not on the card" : (Object) scaleT.fromPerKelvin(scale * c.at(kelvin), 1));
            }
            double boils = BoilingPoints.kelvinAt(card, x);
            boolean bubble = BoilingPoints.fromBubblePoint(card, x);
            tr.add("boiling temperature [" + scaleT.symbol() + "]", card.boiling() == null && !bubble
                    ? "not on the card" : Double.isNaN(boils) ? bubble ? "no bubble point at 1 atm inside the card's "
                    + "range or within 100 K above it" : "outside the card's boiling points"
                    : (Object) scaleT.fromKelvin(boils));
            if (bubble) {
                tr.add("boiling temperature source", boils == card.validity().lowestKelvin()
                        ? "bubble point at 101.325 kPa at or below the card's lowest temperature, which is used"
                        : "bubble point at 101.325 kPa (an open vessel) from the card's G^E and vapour pressures, "
                        + "modified Raoult's law" + (boils > card.validity().highestKelvin() ? ", extrapolated above "
                        + "the card's highest temperature" : ""));
            }
            tr.add("blend heat capacity source", m.heatCapacitySource().words());
            double[] partial = new double[x.length];
            boolean known = true;
            double blend = Double.NaN;
            try {
                blend = m.partialHeatCapacities(x, kelvin, partial);
            } catch (org.miscela.core.problem.MiscelaException missing) {
                known = false; // a component without a heat capacity: the rows say so
            }
            tr.add("blend heat capacity [" + cpUnit + "]",
                    known ? (Object) scaleT.fromPerKelvin(scale * blend, 1) : "not on the card");
            for (int k = 0; k < x.length; k++) {
                tr.add("partial molar heat capacity: " + name(card, k) + " [" + cpUnit + "]",
                        known ? (Object) scaleT.fromPerKelvin(scale * partial[k], 1) : "not on the card");
            }
        }
        return tr.rows.toArray(new Object[0][]);
    }

    /** The words of the vapour trace's assumption row. */
    static final String RAOULT = "modified Raoult's law, y_k·p = x_k·γ_k·p_k*: an ideal vapour, the liquid's volume "
            + "(Poynting factor) neglected; good at low pressure (up to a few bar)";

    /**
     * The trace of an activity-coefficient and bubble-pressure evaluation: the G^E/RT model and its parameters at T,
     * ln γ_k and γ_k, each pure liquid's vapour pressure with its form, the partial pressures, the bubble pressure, the
     * vapour's composition and the assumption behind them.
     */
    static Object[][] vapour(Card card, double[] x, double t, double kelvin, Extrapolation e, List<Violation> outside) {
        Trace tr = new Trace();
        tr.head(card, PropertyKind.VAPOUR.word());
        ExcessModel gibbs = card.mixture().gibbs();
        int n = x.length;
        if (gibbs instanceof ExcessFunction) {
            tr.add("activity model", "Redlich–Kister expansion of G^E/RT (" + ((ExcessFunction) gibbs).model()
                    .cardName() + ")");
        } else {
            tr.add("activity model", ((LocalCompositionGibbs) gibbs).kind().cardName());
        }
        tr.point(card, x, t, kelvin, e, outside);
        if (gibbs instanceof ExcessFunction) {
            tr.pairs(card, (ExcessFunction) gibbs, x, kelvin, 1.0, "1");
        } else {
            LocalCompositionGibbs lc = (LocalCompositionGibbs) gibbs;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (i == j) {
                        continue;
                    }
                    String pair = name(card, i) + " + " + name(card, j);
                    if (lc.kind() == LocalCompositionGibbs.Kind.WILSON) {
                        tr.add("Lambda at T: " + pair, lc.lambda(i, j, kelvin));
                    } else {
                        tr.add("tau at T: " + pair, lc.tau(i, j, kelvin));
                        tr.add("alpha: " + pair, lc.alpha(i, j));
                        tr.add("G at T: " + pair, lc.nrtlG(i, j, kelvin));
                    }
                }
            }
        }
        double[] lnGamma = new double[n];
        double g = card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
        tr.add("excess Gibbs energy G^E/RT", g);
        for (int k = 0; k < n; k++) {
            tr.add("ln activity coefficient: " + name(card, k), lnGamma[k]);
        }
        for (int k = 0; k < n; k++) {
            tr.add("activity coefficient: " + name(card, k), Math.exp(lnGamma[k]));
        }
        Units.Pressure pu = card.pressureUnit();
        String ps = pu.symbol();
        double[] partial = new double[n];
        double p = card.mixture().bubblePressure(x, kelvin, partial);
        for (int k = 0; k < n; k++) {
            org.miscela.core.model.VapourPressure vp = card.vapourPressure(k);
            boolean absent = x[k] == 0.0 && vp == null;
            tr.add("vapour pressure form: " + name(card, k), vp == null ? "not on the card (absent from the blend)"
                    : vp.form());
            tr.add("vapour pressure: " + name(card, k) + " [" + ps + "]", absent ? "not needed (absent)"
                    : (Object) pu.fromPascal(card.mixture().vapourPressure(k, kelvin)));
        }
        for (int k = 0; k < n; k++) {
            tr.add("partial pressure: " + name(card, k) + " [" + ps + "]", pu.fromPascal(partial[k]));
        }
        tr.add("bubble pressure [" + ps + "]", pu.fromPascal(p));
        for (int k = 0; k < n; k++) {
            tr.add("vapour mole fraction: " + name(card, k), partial[k] / p);
        }
        tr.add("assumption", RAOULT);
        return tr.rows.toArray(new Object[0][]);
    }

    /**
     * The vapour trace followed by the flash point's terms by Liaw's model at the same temperature: each flammable
     * liquid's flash point, test method, vapour pressure there and share of Le Chatelier's sum, the sum (1 at the
     * flash point), the blend's flash point (or why there is none) and the model's assumptions.
     */
    static Object[][] flash(Card card, double[] x, double kelvin, Extrapolation e, Object[][] vapourRows) {
        Trace tr = new Trace();
        for (Object[] row : vapourRows) {
            tr.rows.add("property".equals(row[0]) ? new Object[] {"property", PropertyKind.FLASH.word()} : row);
        }
        Units.Temperature tu = card.units().temperature();
        Units.Pressure pu = card.pressureUnit();
        double[] lnGamma = new double[x.length];
        card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
        double sum = 0.0;
        for (int k = 0; k < x.length; k++) {
            double fp = card.flashPointKelvin(k);
            double lfl = card.lowerFlammableLimit(k);
            String who = name(card, k);
            String fpLabel = "flash point: " + who + " [" + tu.symbol() + "]";
            if (Double.isInfinite(fp)) {
                tr.add(fpLabel, "none: does not flash (dilutes only)");
                continue;
            }
            if (Double.isNaN(fp) && Double.isNaN(lfl)) {
                tr.add(fpLabel, "no 'flash point' row on the card");
                continue;
            }
            if (Double.isNaN(fp)) {
                tr.add(fpLabel, "none on the card: its lower flammable limit is used");
                tr.add("lower flammable limit: " + who + " [volume fraction]", lfl);
            } else {
                tr.add(fpLabel, tu.fromKelvin(fp));
                tr.add("flash point test method: " + who, card.flashPointMethod(k));
            }
            double reference = FlashPoints.referencePascal(card, k);
            tr.add("vapour pressure at its flash point: " + who + " [" + pu.symbol() + "]", pu.fromPascal(reference));
            double share = x[k] * Math.exp(lnGamma[k]) * card.mixture().vapourPressure(k, kelvin) / reference;
            tr.add("flammable share x·γ·p*(T)/p*(T_fp): " + who, share);
            sum += share;
        }
        tr.add("Le Chatelier sum at T (1 at the flash point)", sum);
        Object blend;
        try {
            blend = FlashPoints.flashPoint(card, x, false, e);
        } catch (org.miscela.core.problem.MiscelaException none) {
            blend = none.getMessage();
        }
        tr.add("flash point of the blend [" + tu.symbol() + "]", blend);
        tr.add("flash point model", "Liaw et al.: Σ x_i·γ_i·p_i*(T)/p_i*(T_fp,i) = 1 over the flammable liquids "
                + "(Le Chatelier's rule with modified Raoult's law); liquids marked none only dilute; an estimate of "
                + "a closed-cup flash point, which measured values and local codes overrule");
        return tr.rows.toArray(new Object[0][]);
    }

    /**
     * The freezing point's terms at T: for each component with melting rows, its melting data, ln(x·γ) at T and the
     * solid line's ln a at T (equal at its freezing point), then the blend's freezing point, the component that freezes
     * first and the model's assumptions.
     */
    static Object[][] freezing(Card card, double[] x, double t, double kelvin, Extrapolation e,
            List<Violation> outside) {
        Trace tr = new Trace();
        Units.Temperature tu = card.units().temperature();
        tr.head(card, PropertyKind.FREEZING.word());
        tr.point(card, x, t, kelvin, e, outside);
        org.miscela.core.model.PitzerOsmotic osmotic = card.osmotic();
        double[] lnGamma = new double[x.length];
        if (osmotic == null) {
            card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
        } else {
            double m = osmotic.molality(x);
            tr.add("molality: " + name(card, osmotic.solute()) + " [mol/kg]", m);
            tr.add("ions per formula unit", (double) osmotic.ions());
            tr.add("Debye-Hückel slope A_φ [kg^½/mol^½]", org.miscela.core.model.PitzerOsmotic.debyeHuckel(kelvin));
            tr.add("osmotic coefficient φ (Pitzer)", osmotic.osmoticCoefficient(m, kelvin));
        }
        for (int k = 0; k < x.length; k++) {
            org.miscela.core.card.Fusion f = card.fusion(k);
            String who = name(card, k);
            if (f == null) {
                tr.add("melting point: " + who + " [" + tu.symbol() + "]", "no melting rows on the card");
                continue;
            }
            tr.add("melting point: " + who + " [" + tu.symbol() + "]", f.meltingAsStated());
            tr.add("enthalpy of fusion: " + who + " [J/mol]", f.enthalpy());
            tr.add("heat capacity of fusion: " + who + " [J/(mol K)]", f.heatCapacity());
            if (osmotic != null) {
                tr.add("ln a in the liquid (−φ·ν·m·M_w): " + who, k == osmotic.solvent() && x[k] > 0.0
                        ? (Object) osmotic.lnWaterActivity(x, kelvin) : "the osmotic coefficient gives the water's only");
            } else {
                tr.add("ln activity coefficient: " + who, lnGamma[k]);
                tr.add("ln(x·γ) in the liquid: " + who, x[k] > 0.0 ? (Object) (Math.log(x[k]) + lnGamma[k])
                        : "absent from the blend");
            }
            tr.add("ln a of the pure liquid over its solid at T: " + who, PhaseFunctions.solidLine(f, kelvin));
        }
        Object blend;
        Object which;
        try {
            blend = PhaseFunctions.freezingPoint(card, -1, x, PhaseFunctions.Activity.CARD, e);
            which = card.components().get(PhaseFunctions.freezingComponent(card, -1, x,
                    PhaseFunctions.Activity.CARD)).name();
        } catch (org.miscela.core.problem.MiscelaException none) {
            blend = none.getMessage();
            which = "none";
        }
        tr.add("freezing point of the blend [" + tu.symbol() + "]", blend);
        tr.add("component that freezes first", which);
        tr.add("freezing model", "solid-liquid equilibrium with a pure solid: ln(x·γ) = −(ΔH_fus/R)(1/T − 1/T_m) + "
                + "(ΔCp/R)[(T_m/T − 1) − ln(T_m/T)], " + (osmotic == null ? "γ from the card's G^E"
                        : "the water's activity from Pitzer's osmotic coefficient, ln a_w = −φ·ν·m·M_w") + "; no solid "
                + "solutions, no eutectic search; "
                + "an estimate that measured freezing points overrule");
        return tr.rows.toArray(new Object[0][]);
    }

    /** Per pair: the series argument d, each coefficient at T, and the pair's term; then the ternary terms. */
    private void pairs(Card card, ExcessFunction f, double[] x, double kelvin, double scale, String unit) {
        int n = card.componentCount();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (f.pair(i, j) == null) {
                    add("pair term: " + name(card, i) + " + " + name(card, j) + " [" + unit + "]", 0.0);
                    add("pair coefficients: " + name(card, i) + " + " + name(card, j),
                            "none on the card: treated as ideal");
                }
            }
        }
        for (int p = 0; p < f.pairCount(); p++) {
            String pair = name(card, f.pairFirst(p)) + " + " + name(card, f.pairSecond(p));
            RedlichKister r = f.pairExpansion(p);
            add("pair argument d: " + pair, f.pairCoordinate(p, x));
            for (int k = 0; k <= r.order(); k++) {
                add("A" + k + " at T: " + pair + " [" + unit + "]", scale * r.coefficientAt(k, kelvin));
            }
            add("pair term: " + pair + " [" + unit + "]", scale * f.pairContribution(p, x, kelvin));
        }
        List<TernaryTerm> ternary = f.ternaryTerms();
        for (int t = 0; t < ternary.size(); t++) {
            TernaryTerm term = ternary.get(t);
            String triple = name(card, term.first()) + " + " + name(card, term.second()) + " + "
                    + name(card, term.third());
            for (int c = 0; c < term.coefficientCount(); c++) {
                add("C" + c + " at T: " + triple + " [" + unit + "]", scale * term.coefficientAt(c, kelvin, false));
            }
            add("ternary term: " + triple + " [" + unit + "]", scale * f.ternaryContribution(t, x, kelvin));
        }
    }

    /** The rows every trace opens with: the card, its source, the property traced and the number of components. */
    private void head(Card card, String property) {
        add("card", card.title());
        add("source", card.source());
        add("property", property);
        add("components", (double) card.componentCount());
    }

    /** The point traced: its temperature (card unit and K), the extrapolation, the limits it crosses, x. */
    private void point(Card card, double[] x, double t, double kelvin, Extrapolation e, List<Violation> outside) {
        add("temperature [" + card.units().temperature().symbol() + "]", t);
        add("temperature [K]", kelvin);
        add("extrapolation", extrapolation(card, e));
        if (outside.isEmpty()) {
            add("outside validity", "none");
        }
        for (Violation v : outside) {
            add("outside validity", v.limit());
        }
        for (int k = 0; k < x.length; k++) {
            add("mole fraction: " + name(card, k), x[k]);
        }
    }

    private static String extrapolation(Card card, Extrapolation e) {
        switch (e) {
            case ALLOW:
                return "allowed by the extrapolate argument";
            case REFUSE:
                return "refused by the extrapolate argument";
            default:
                return card.extrapolationAllowed() ? "allowed by the card" : "refused (the card's default)";
        }
    }

    private static String name(Card card, int k) {
        return card.components().get(k).name();
    }

    private void add(String label, Object value) {
        rows.add(new Object[] {label, value});
    }
}
