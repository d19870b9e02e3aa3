package org.miscela.core.card;

import static org.miscela.core.card.CardLabels.COMPONENT;
import static org.miscela.core.card.CardLabels.COMPONENT_ORDER;
import static org.miscela.core.card.CardLabels.DENSITY_COEFFICIENTS;
import static org.miscela.core.card.CardLabels.DENSITY_MODEL;
import static org.miscela.core.card.CardLabels.DENSITY_REFERENCE;
import static org.miscela.core.card.CardLabels.DENSITY_UNIT;
import static org.miscela.core.card.CardLabels.ENTHALPY_UNIT;
import static org.miscela.core.card.CardLabels.EXCESS_ENTHALPY;
import static org.miscela.core.card.CardLabels.EXCESS_VOLUME;
import static org.miscela.core.card.CardLabels.EXTRAPOLATION;
import static org.miscela.core.card.CardLabels.HEAT_CAPACITY;
import static org.miscela.core.card.CardLabels.HEAT_CAPACITY_REFERENCE;
import static org.miscela.core.card.CardLabels.MISSING_PAIRS;
import static org.miscela.core.card.CardLabels.MODEL;
import static org.miscela.core.card.CardLabels.MOLAR_MASS_UNIT;
import static org.miscela.core.card.CardLabels.MOLAR_VOLUME_UNIT;
import static org.miscela.core.card.CardLabels.SOURCE;
import static org.miscela.core.card.CardLabels.TEMPERATURE_UNIT;
import static org.miscela.core.card.CardLabels.TITLE;
import static org.miscela.core.card.CardReader.normalise;

import org.miscela.core.model.AntoineVapourPressure;
import org.miscela.core.model.Dippr101VapourPressure;
import org.miscela.core.model.VapourPressure;
import org.miscela.core.model.WagnerVapourPressure;
import org.miscela.core.model.ApparentVolumeDensity;
import org.miscela.core.model.Component;
import org.miscela.core.model.Dippr105Density;
import org.miscela.core.model.TabulatedDensity;
import org.miscela.core.model.ExcessModel;
import org.miscela.core.model.Kell1975WaterDensity;
import org.miscela.core.model.LocalCompositionGibbs;
import org.miscela.core.model.MassFractionPolynomialDensity;
import org.miscela.core.model.MixtureDensityModel;
import org.miscela.core.model.ModelLimitDensity;
import org.miscela.core.model.ConstantDensity;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.ApparentHeatCapacity;
import org.miscela.core.model.BoilingCurve;
import org.miscela.core.model.HeatCapacity;
import org.miscela.core.model.SolutionHeatCapacity;
import org.miscela.core.model.PolynomialDensity;
import org.miscela.core.model.PitzerOsmotic;
import org.miscela.core.model.PureDensity;
import org.miscela.core.model.Tanaka2001WaterDensity;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Builds a {@link Card} from a card's sorted rows: reads each row's values as the format defines them, converts them
 * to internal units and checks them (units known, masses and densities positive, every keyed row about a declared
 * component, the models' ranges covering the validity range), in a fixed order, so the same card always fails with
 * the same first problem. The validity range is read by {@link ValidityBuilder}, each excess-property section by
 * {@link ExcessSectionBuilder}.
 */
final class CardBuilder {
    /** Intervals the validity range is split into when checking a density model stays positive. */
    private static final int DENSITY_SAMPLES = 256;

    private final ParsedCard rows;
    /** Whether only the pure-component part is read ({@link CardReader#readPureComponents}). */
    private final boolean pureOnly;
    /** Set by {@link #localComposition}: the 'Wilson volume' rows (cm³/mol), or null. */
    private double[] wilsonVolumes;
    private Units units;
    /** g/mol by normalised component name (a DIPPR 105 density is in mol/dm³). */
    private final Map<String, Double> molarMasses = new java.util.HashMap<>();

    /** The rows and columns the range holds, to the last non-blank cell ({@link CardReader#extent}). */
    private final int[] extent;

    CardBuilder(ParsedCard rows, boolean pureOnly, int[] extent) {
        this.rows = rows;
        this.pureOnly = pureOnly;
        this.extent = extent;
    }

    /**
     * A card placed by an array formula states its size ('card size | rows | columns'); a block too small for it
     * cuts rows or columns off without a sign, so a range smaller than the stated size is refused.
     */
    private void checkSize() {
        CardRow r = rows.global(CardLabels.CARD_SIZE);
        if (r == null) {
            return;
        }
        r.atMost(2);
        double statedRows = r.number(0);
        double statedColumns = r.number(1);
        for (double v : new double[] {statedRows, statedColumns}) {
            if (!(v >= 1 && v == Math.rint(v) && v < 1e6)) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, "card size", "a whole number of rows and of "
                        + "columns", "found " + Numbers.show(v));
            }
        }
        if (extent[0] < statedRows || extent[1] < statedColumns) {
            throw Problem.CARD_CUT_SHORT.raise(r.number, (int) statedRows, (int) statedColumns, extent[0], extent[1]);
        }
    }

    Card card() {
        checkSize();
        Units.MolarEnthalpy enthalpyUnit = rows.global(ENTHALPY_UNIT) != null
                ? unit(ENTHALPY_UNIT, Units.MolarEnthalpy.class) : null;
        units = new Units(unit(TEMPERATURE_UNIT, Units.Temperature.class), unit(DENSITY_UNIT, Units.Density.class),
                unit(MOLAR_VOLUME_UNIT, Units.MolarVolume.class), unit(MOLAR_MASS_UNIT, Units.MolarMass.class),
                enthalpyUnit);
        String source = rows.required(SOURCE).text(0);
        rows.required(SOURCE).atMost(1);
        CardRow titleRow = rows.global(TITLE);
        String title = titleRow == null ? "" : titleRow.text(0);
        if (titleRow != null) {
            titleRow.atMost(1);
        }
        Map<String, CardRow> componentRows = rows.keyed(COMPONENT);
        List<String> names = new ArrayList<>();
        List<Double> masses = new ArrayList<>();
        for (CardRow r : componentRows.values()) {
            String name = r.text(0).trim();
            if (name.indexOf('+') >= 0) {
                // refused here, on its own row: otherwise the first pair row naming it would be blamed
                throw Problem.NAME_WITH_PLUS.raise(r.number, r.label, name);
            }
            names.add(name);
            double mass = r.number(1);
            if (!(mass > 0)) {
                throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the molar mass", Numbers.show(mass));
            }
            r.atMost(2);
            masses.add(units.molarMass().toGramPerMol(mass));
        }
        if (names.size() < 2) {
            throw Problem.TOO_FEW_COMPONENTS.raise(names.size());
        }
        checkOrder(names);
        checkSubjects(componentRows);
        for (int i = 0; i < names.size(); i++) {
            molarMasses.put(normalise(names.get(i)), masses.get(i));
        }
        Subjects subjects = new Subjects(names);
        Validity validity = new ValidityBuilder(rows, subjects, units.temperature()).validity(pureOnly);
        MixtureDensityModel mixtureDensity = mixtureDensity(names, validity);
        List<Component> components = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            components.add(new Component(names.get(i), masses.get(i), pureDensity(mixtureDensity, i, names,
                    validity), heatCapacity(names.get(i))));
        }
        int[] asymmetric = {-1};
        GeometricModel model = model(subjects, asymmetric);
        boolean missingIdeal = choice(MISSING_PAIRS, "ideal", "refuse") || pureOnly;
        // A card may describe enthalpy alone; then the volumetric functions refuse rather than guess.
        boolean enthalpyOnly = !rows.hasSection(EXCESS_VOLUME) && (rows.hasSection(EXCESS_ENTHALPY)
                || rows.hasSection(CardLabels.EXCESS_GIBBS) || !rows.keyed(CardLabels.WILSON).isEmpty()
                || !rows.keyed(CardLabels.NRTL).isEmpty());
        if (mixtureDensity != null && rows.hasSection(EXCESS_VOLUME)) {
            throw Problem.VOLUME_STATED_TWICE.raise(mixtureDensity.modelName());
        }
        ExcessFunction volume = enthalpyOnly || mixtureDensity != null ? null
                : section(EXCESS_VOLUME, units.molarVolume().toCm3PerMol(1.0), subjects, model, asymmetric[0],
                        missingIdeal);
        ExcessFunction enthalpy = null;
        if (rows.hasSection(EXCESS_ENTHALPY)) {
            if (enthalpyUnit == null) {
                throw Problem.MISSING_ROW.raise(ENTHALPY_UNIT);
            }
            enthalpy = section(EXCESS_ENTHALPY, enthalpyUnit.toJoulePerMol(1.0), subjects, model, asymmetric[0],
                    missingIdeal);
        }
        boolean allow = choice(EXTRAPOLATION, "allow", "refuse");
        double basisReferenceKelvin = Double.NaN;
        CardRow basisReference = rows.global(CardLabels.BASIS_REFERENCE);
        if (basisReference != null) {
            basisReference.atMost(1);
            double kelvin = units.temperature().toKelvin(basisReference.number(0));
            if (!(kelvin > 0.0) || Double.isInfinite(kelvin)) {
                throw Problem.NOT_POSITIVE.raise(basisReference.number, basisReference.label,
                        "the basis reference temperature (in kelvin)", Numbers.show(kelvin));
            }
            basisReferenceKelvin = kelvin;
        }
        ExcessModel gibbs = rows.hasSection(CardLabels.EXCESS_GIBBS) ? section(CardLabels.EXCESS_GIBBS, 1.0,
                subjects, model, asymmetric[0], missingIdeal) : null;
        ExcessModel local = localComposition(subjects, missingIdeal);
        if (local != null && gibbs != null) {
            CardRow r = rows.keyed(((LocalCompositionGibbs) local).kind() == LocalCompositionGibbs.Kind.WILSON
                    ? CardLabels.WILSON : CardLabels.NRTL).values().iterator().next();
            throw Problem.MODEL_VALUES.raise(r.number, r.label, r.label, "no 'excess Gibbs energy' rows beside it",
                    "the card states G^E one way; remove one of them");
        }
        gibbs = gibbs != null ? gibbs : local;
        Units.Pressure pressure = rows.global(CardLabels.PRESSURE_UNIT) != null
                ? unit(CardLabels.PRESSURE_UNIT, Units.Pressure.class) : null;
        VapourPressure[] vapour = vapourPressures(names, pressure);
        double[][] flash = {null};
        String[] flashMethods = flashPoints(names, flash);
        return new Card(title, source, units, components, volume, enthalpy, validity, allow, missingIdeal,
                basisReferenceKelvin, solutionHeatCapacity(names, masses), boilingCurve(names), mixtureDensity,
                new Card.PhaseData(gibbs, vapour, pressure, wilsonVolumes, flash[0] == null ? null : flash[0],
                        flashMethods, lowerFlammableLimits(names), fusion(names), osmotic(names, masses, gibbs, validity)));
    }

    /**
     * The water's activity by Pitzer's osmotic coefficient: an 'osmotic coefficient | salt | Pitzer | z_M | |z_X|
     * [| lowest | highest temperature]' row on a card of the salt and the water the 'solvent' row names, with 'Pitzer beta0', 'Pitzer beta1' and 'Pitzer
     * Cphi' rows for the salt, each one to six terms of its function of T (K, {@link PitzerOsmotic}); null when the
     * card has none. A card states the liquid's activity one way: no G^E rows beside it.
     */
    private PitzerOsmotic osmotic(List<String> names, List<Double> masses, ExcessModel gibbs, Validity validity) {
        Map<String, CardRow> rowsBySalt = rows.keyed(CardLabels.OSMOTIC);
        if (rowsBySalt.isEmpty()) {
            for (String label : new String[] {CardLabels.PITZER[0], CardLabels.PITZER[1], CardLabels.PITZER[2],
                CardLabels.ICE_LIMIT}) {
                if (!rows.keyed(label).isEmpty()) {
                    throw Problem.MISSING_PAIR_ROW.raise(label, "the salt", CardLabels.OSMOTIC);
                }
            }
            return null;
        }
        CardRow r = rowsBySalt.values().iterator().next();
        if (gibbs != null) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "no G^E rows beside it",
                    "the card states the liquid's activity one way; remove one of them");
        }
        if (names.size() != 2) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "a card of one salt and the "
                    + "water", "this card has " + names.size() + " components; mixed salts need mixing terms the card "
                    + "cannot hold");
        }
        int solvent = solvent(names);
        int solute = 1 - solvent;
        double[] v = soluteParameters(names, solvent, rowsBySalt, PitzerOsmotic.NAME, -1, "")[solute];
        if (v.length != 2 && v.length != 4) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "the cation's charge and the size "
                    + "of the anion's, optionally followed by the lowest and highest temperature the parameters hold "
                    + "for", "found " + v.length + " number(s)");
        }
        double lowest = Double.NaN;
        double highest = Double.NaN;
        if (v.length == 4) {
            lowest = units.temperature().toKelvin(v[2]);
            highest = units.temperature().toKelvin(v[3]);
            if (!(lowest > 0.0 && highest > lowest) || Double.isInfinite(highest)) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "a lowest temperature above "
                        + "absolute zero and a higher highest one", "found " + Numbers.show(v[2]) + " and "
                        + Numbers.show(v[3]));
            }
        }
        for (int i = 0; i < 2; i++) {
            if (v[i] != Math.rint(v[i]) || v[i] < 1 || v[i] > 3) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "the cation's charge and the "
                        + "size of the anion's, whole numbers 1 to 3", "found " + Numbers.show(v[i]));
            }
        }
        if (v[0] > 1 && v[1] > 1) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, PitzerOsmotic.NAME, "at least one univalent ion",
                    "a 2:2 salt needs Pitzer's further β(2) term, which the card cannot hold");
        }
        double[][] terms = new double[3][];
        for (int i = 0; i < 3; i++) {
            String label = CardLabels.PITZER[i];
            CardRow p = rows.keyed(label).get(normalise(names.get(solute)));
            if (rows.keyed(label).size() > (p == null ? 0 : 1)) {
                CardRow other = rows.keyed(label).values().stream().filter(o -> o != p).findFirst().get();
                throw Problem.MODEL_VALUES.raise(other.number, other.label, PitzerOsmotic.NAME, "its rows for the "
                        + "salt " + names.get(solute), "this row names another component");
            }
            if (p == null) {
                throw Problem.MISSING_PAIR_ROW.raise(CardLabels.OSMOTIC, names.get(solute), label);
            }
            terms[i] = p.numbersFrom(1);
            if (terms[i].length < 1 || terms[i].length > PitzerOsmotic.TERMS) {
                throw Problem.MODEL_VALUES.raise(p.number, p.label, PitzerOsmotic.NAME, "one to six terms of its "
                        + "function of T", "found " + terms[i].length);
            }
        }
        CardRow limit = rows.keyed(CardLabels.ICE_LIMIT).get(normalise(names.get(solute)));
        if (limit == null) {
            throw Problem.MISSING_PAIR_ROW.raise(CardLabels.OSMOTIC, names.get(solute), CardLabels.ICE_LIMIT);
        }
        limit.atMost(2);
        double iceLimit = limit.number(1);
        if (!(iceLimit > 0.0 && iceLimit < 1.0)) {
            throw Problem.MODEL_VALUES.raise(limit.number, limit.label, PitzerOsmotic.NAME, "the salt's mole fraction "
                    + "past which ice is no longer known to form first, between 0 and 1", "found "
                    + Numbers.show(iceLimit));
        }
        if (iceLimit > validity.highestFraction(solute)) {
            // a limit the card's own range never reaches is most likely a mass fraction typed for a mole fraction
            throw Problem.MODEL_VALUES.raise(limit.number, limit.label, PitzerOsmotic.NAME, "the salt's mole fraction "
                    + "at the eutectic, inside the card's valid mole fraction (up to "
                    + Numbers.show(validity.highestFraction(solute)) + ")", "found " + Numbers.show(iceLimit)
                    + ": a mass fraction or percentage typed for a mole fraction?");
        }
        return new PitzerOsmotic(solvent, solute, masses.get(solvent), (int) v[0], (int) v[1], terms, lowest,
                highest, iceLimit);
    }

    /**
     * Each component's melting data: 'melting point | component | T_m' (card temperature unit), 'enthalpy of fusion |
     * component | ΔH_fus' (card enthalpy unit) and optionally 'heat capacity of fusion | component | ΔCp' (liquid minus
     * solid, enthalpy unit per degree of the card's temperature scale); null when the card gives none. The first two
     * come together; T_m (in kelvin) and ΔH_fus must be greater than zero, ΔCp a finite number.
     */
    private Fusion[] fusion(List<String> names) {
        Map<String, CardRow> melting = rows.keyed(CardLabels.MELTING_POINT);
        Map<String, CardRow> enthalpy = rows.keyed(CardLabels.FUSION_ENTHALPY);
        Map<String, CardRow> heat = rows.keyed(CardLabels.FUSION_HEAT_CAPACITY);
        if (melting.isEmpty() && enthalpy.isEmpty() && heat.isEmpty()) {
            return null;
        }
        Fusion[] out = new Fusion[names.size()];
        for (int k = 0; k < names.size(); k++) {
            String subject = normalise(names.get(k));
            CardRow m = melting.get(subject);
            CardRow h = enthalpy.get(subject);
            CardRow c = heat.get(subject);
            if (m == null && h == null && c == null) {
                continue;
            }
            if (m == null || h == null) {
                String have = m != null ? CardLabels.MELTING_POINT : h != null ? CardLabels.FUSION_ENTHALPY
                        : CardLabels.FUSION_HEAT_CAPACITY;
                throw Problem.MISSING_PAIR_ROW.raise(have, names.get(k), m == null ? CardLabels.MELTING_POINT
                        : CardLabels.FUSION_ENTHALPY);
            }
            if (units.enthalpy() == null) {
                throw Problem.MISSING_ROW.raise(ENTHALPY_UNIT);
            }
            m.atMost(2);
            h.atMost(2);
            double stated = m.number(1);
            double kelvin = units.temperature().toKelvin(stated);
            if (!(kelvin > 0.0) || Double.isInfinite(kelvin)) {
                throw Problem.NOT_POSITIVE.raise(m.number, m.label, "the melting point (in kelvin)",
                        Numbers.show(kelvin));
            }
            double dh = units.enthalpy().toJoulePerMol(h.number(1));
            if (!(dh > 0.0) || Double.isInfinite(dh)) {
                throw Problem.NOT_POSITIVE.raise(h.number, h.label, "the enthalpy of fusion",
                        Numbers.show(h.number(1)));
            }
            double dcp = 0.0;
            if (c != null) {
                c.atMost(2);
                dcp = units.temperature().toPerKelvin(units.enthalpy().toJoulePerMol(c.number(1)), 1);
                if (!Double.isFinite(dcp) || 0.1 * Math.abs(dcp) * kelvin >= dh) {
                    // ΔH_fus + ΔCp·(T − T_m), the enthalpy of fusion at T, must stay positive within 10 % of T_m
                    throw Problem.MODEL_VALUES.raise(c.number, c.label, CardLabels.FUSION_HEAT_CAPACITY, "a value "
                            + "smaller in size than 10·ΔH_fus/T_m = " + Numbers.show(units.temperature().fromPerKelvin(
                                    units.enthalpy().fromJoulePerMol(10 * dh / kelvin), 1)) + ", or the enthalpy of "
                            + "fusion would vanish within 10 % of the melting point", "found "
                            + Numbers.show(c.number(1)));
                }
            }
            out[k] = new Fusion(kelvin, stated, dh, dcp, c != null);
        }
        return out;
    }

    /**
     * G^E/RT by Wilson's or the NRTL model, or null: one row per pair, 'Wilson | a + b | Δλ_ab/R | Δλ_ba/R' (K) or
     * with a, b, c of each (a + b·T + c·T²), and 'Wilson volume | component | V' (molar volume unit) for every
     * component; or 'NRTL | a + b | τ_ab | τ_ba | α' or 'NRTL | a + b | A_ab | B_ab | A_ba | B_ba | α' (τ = A + B/T, B
     * in K). A pair without a row is an error unless the card says 'missing pairs | ideal'.
     */
    private ExcessModel localComposition(Subjects subjects, boolean missingIdeal) {
        Map<String, CardRow> wilson = rows.keyed(CardLabels.WILSON);
        Map<String, CardRow> nrtl = rows.keyed(CardLabels.NRTL);
        Map<String, CardRow> volumes = rows.keyed(CardLabels.WILSON_VOLUME);
        if (wilson.isEmpty() && nrtl.isEmpty()) {
            if (!volumes.isEmpty()) {
                if (!pureOnly) {
                    throw Problem.MISSING_PAIR_ROW.raise(CardLabels.WILSON_VOLUME, "the mixture", "Wilson");
                }
                // the pure part a Wilson fit reads: the volumes the fitted rows below it will use
                wilsonVolumes = wilsonVolumes(subjects, volumes, false);
            }
            return null;
        }
        if (!wilson.isEmpty() && !nrtl.isEmpty()) {
            CardRow r = nrtl.values().iterator().next();
            throw Problem.MODEL_VALUES.raise(r.number, r.label, "NRTL", "no 'Wilson' rows beside it",
                    "the card states G^E one way; remove one of them");
        }
        boolean isWilson = !wilson.isEmpty();
        int n = subjects.size();
        double[][] a = new double[n][n];
        double[][] b = new double[n][n];
        double[][] c = new double[n][n];
        double[][] alpha = new double[n][n];
        boolean[][] ideal = new boolean[n][n];
        // the row of each pair: 'a + b' and 'b + a' are different subjects to the grammar, one pair here
        CardRow[][] seen = new CardRow[n][n];
        for (CardRow r : (isWilson ? wilson : nrtl).values()) {
            int[] m = subjects.members(r, 2);
            int i = m[0];
            int j = m[1];
            if (seen[i][j] != null) {
                throw Problem.DUPLICATE_ROW.raise(r.number, r.label, seen[i][j].number);
            }
            seen[i][j] = r;
            seen[j][i] = r;
            double[] v = r.numbersFrom(1);
            if (isWilson) {
                if (v.length != 2 && v.length != 6) {
                    throw Problem.MODEL_VALUES.raise(r.number, r.label, "Wilson", "Δλ/R (K) of each order, 2 values, or "
                            + "a, b, c of each, 6 values", "found " + v.length);
                }
                int per = v.length / 2;
                a[i][j] = v[0];
                a[j][i] = v[per];
                if (per == 3) {
                    b[i][j] = v[1];
                    c[i][j] = v[2];
                    b[j][i] = v[4];
                    c[j][i] = v[5];
                }
            } else {
                if (v.length != 3 && v.length != 5) {
                    throw Problem.MODEL_VALUES.raise(r.number, r.label, "NRTL", "τ_ab, τ_ba and α, or A_ab, B_ab, A_ba, "
                            + "B_ba and α", "found " + v.length);
                }
                if (v.length == 3) {
                    a[i][j] = v[0];
                    a[j][i] = v[1];
                } else {
                    a[i][j] = v[0];
                    b[i][j] = v[1];
                    a[j][i] = v[2];
                    b[j][i] = v[3];
                }
                alpha[i][j] = v[v.length - 1];
                alpha[j][i] = v[v.length - 1];
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (seen[i][j] == null) {
                    if (!missingIdeal) {
                        throw Problem.MISSING_MODEL_PAIR.raise(isWilson ? "Wilson" : "NRTL", subjects.name(i),
                                subjects.name(j));
                    }
                    ideal[i][j] = true;
                    ideal[j][i] = true;
                }
            }
        }
        if (!isWilson) {
            return LocalCompositionGibbs.nrtl(a, b, alpha, ideal);
        }
        double[] volume = wilsonVolumes(subjects, volumes, true);
        wilsonVolumes = volume;
        return LocalCompositionGibbs.wilson(volume, a, b, c, ideal);
    }

    /**
     * Each component's 'flash point' row, 'flash point | component | T | test method' (T in the card's temperature
     * unit; the method, e.g. "closed cup, ASTM D56", is required), or 'flash point | component | none' for a liquid
     * that does not flash: the kelvins into {@code kelvin[0]} (NaN without a row, +∞ for none) and the methods
     * returned; nothing (nulls) when the card has no such row.
     */
    private String[] flashPoints(List<String> names, double[][] kelvin) {
        Map<String, CardRow> byComponent = rows.keyed(CardLabels.FLASH_POINT);
        if (byComponent.isEmpty()) {
            return null;
        }
        double[] out = new double[names.size()];
        String[] methods = new String[names.size()];
        for (int k = 0; k < names.size(); k++) {
            CardRow r = byComponent.get(normalise(names.get(k)));
            if (r == null) {
                out[k] = Double.NaN;
                continue;
            }
            Object first = r.values.length > 1 ? r.values[1] : null;
            if (first instanceof String && sameKeyword(((String) first).trim(), "none")) {
                r.atMost(2);
                out[k] = Double.POSITIVE_INFINITY;
                continue;
            }
            double kelvinAt = units.temperature().toKelvin(r.number(1));
            String method = r.values.length > 2 && r.values[2] instanceof String ? ((String) r.values[2]).trim() : "";
            if (method.isEmpty()) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, "flash point", "the temperature and then the test "
                        + "method (e.g. closed cup, ASTM D56), or the word none for a liquid that does not flash",
                        "found no method");
            }
            r.atMost(3);
            if (!(kelvinAt > 0) || Double.isInfinite(kelvinAt)) {
                throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the flash point (in kelvin)",
                        Numbers.show(kelvinAt));
            }
            out[k] = kelvinAt;
            methods[k] = method;
        }
        kelvin[0] = out;
        return methods;
    }

    /**
     * Each component's 'lower flammable limit | component | L | unit' row: L in "% by volume" (or "% vol", "%") or as
     * a "volume fraction", between 0 and 1 as a fraction; NaN for a component without a row, null without any.
     */
    private double[] lowerFlammableLimits(List<String> names) {
        Map<String, CardRow> byComponent = rows.keyed(CardLabels.LOWER_FLAMMABLE_LIMIT);
        if (byComponent.isEmpty()) {
            return null;
        }
        double[] out = new double[names.size()];
        for (int k = 0; k < names.size(); k++) {
            CardRow r = byComponent.get(normalise(names.get(k)));
            if (r == null) {
                out[k] = Double.NaN;
                continue;
            }
            double value = r.number(1);
            String unit = r.text(2).trim();
            double factor = sameKeyword(unit, "% by volume") || sameKeyword(unit, "% vol") || sameKeyword(unit, "%")
                    ? 0.01 : sameKeyword(unit, "volume fraction") ? 1.0 : Double.NaN;
            if (Double.isNaN(factor)) {
                throw Problem.BAD_KEYWORD.raise(r.number, r.label, unit, "% by volume, % vol, %, volume fraction");
            }
            r.atMost(3);
            double fraction = value * factor;
            if (!(fraction > 0.0 && fraction < 1.0)) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, "lower flammable limit", "a share of the air "
                        + "mixture above 0 and below 100 % by volume", "found " + Numbers.show(value) + " " + unit);
            }
            out[k] = fraction;
        }
        return out;
    }

    /** The 'Wilson volume' rows in cm³/mol, NaN for a component without one unless each must have one. */
    private double[] wilsonVolumes(Subjects subjects, Map<String, CardRow> volumes, boolean required) {
        int n = subjects.size();
        double[] volume = new double[n];
        for (int k = 0; k < n; k++) {
            CardRow r = volumes.get(normalise(subjects.name(k)));
            if (r == null) {
                if (required) {
                    throw Problem.MISSING_PAIR_ROW.raise("Wilson", subjects.name(k), CardLabels.WILSON_VOLUME);
                }
                volume[k] = Double.NaN;
                continue;
            }
            r.atMost(2);
            volume[k] = units.molarVolume().toCm3PerMol(r.number(1));
            if (!(volume[k] > 0) || Double.isInfinite(volume[k])) {
                throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the molar volume", Numbers.show(volume[k]));
            }
        }
        return volume;
    }

    /**
     * Each component's 'vapour pressure' row: the form, then its constants in the card's temperature and pressure
     * units, then optionally the lowest and highest temperature they hold for; null when the card has no such row.
     * 'Antoine': A, B, C of log10(p) = A − B/(C + t). 'Wagner 3-6' (six coefficients) and 'Wagner 2.5-5' (four): T_c and
     * p_c, then a_1 … of ln(p/p_c) = (T_c/T)·Σ a_i·τ^e_i, τ = 1 − T/T_c. 'DIPPR 101': C1 … C5 of
     * ln(p/Pa) = C1 + C2/T + C3·ln T + C4·T^C5 with T in K, always in K and Pa as Perry's Table 2-8 prints them (the
     * form needs an absolute temperature, and a pressure unit would shift C1 by its logarithm, a step easily missed);
     * only its range is in the card's temperature unit.
     */
    private VapourPressure[] vapourPressures(List<String> names, Units.Pressure pressure) {
        Map<String, CardRow> byComponent = rows.keyed(CardLabels.VAPOUR_PRESSURE);
        if (byComponent.isEmpty()) {
            return null;
        }
        if (pressure == null) {
            throw Problem.MISSING_ROW.raise(CardLabels.PRESSURE_UNIT);
        }
        Units.Temperature tu = units.temperature();
        // t = perKelvin·T + offset in the card's temperature unit
        double offset = tu.fromKelvin(0.0);
        double perKelvin = tu.fromKelvin(1.0) - offset;
        String forms = AntoineVapourPressure.NAME + ", " + WagnerVapourPressure.NAME_3_6 + ", "
                + WagnerVapourPressure.NAME_2_5 + ", " + Dippr101VapourPressure.NAME;
        VapourPressure[] out = new VapourPressure[names.size()];
        for (int k = 0; k < names.size(); k++) {
            CardRow r = byComponent.get(normalise(names.get(k)));
            if (r == null) {
                continue;
            }
            String form = r.text(1).trim();
            int constants = sameKeyword(form, AntoineVapourPressure.NAME) ? 3
                    : sameKeyword(form, WagnerVapourPressure.NAME_3_6) ? 8
                    : sameKeyword(form, WagnerVapourPressure.NAME_2_5) ? 6
                    : sameKeyword(form, Dippr101VapourPressure.NAME) ? 5 : -1;
            if (constants < 0) {
                throw Problem.BAD_KEYWORD.raise(r.number, r.label, form, forms);
            }
            double[] v = r.numbersFrom(2);
            if (v.length != constants && v.length != constants + 2) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, form, constants + " constants, then optionally "
                        + "the lowest and highest temperature they hold for", "found " + v.length + " value(s)");
            }
            double lo = v.length > constants ? tu.toKelvin(v[constants]) : Double.NEGATIVE_INFINITY;
            double hi = v.length > constants ? tu.toKelvin(v[constants + 1]) : Double.POSITIVE_INFINITY;
            if (v.length > constants && !(hi > lo)) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, form, "a lowest temperature below the highest",
                        "found " + Numbers.show(v[constants]) + " and " + Numbers.show(v[constants + 1]));
            }
            if (constants == 5) {
                // Perry's and the DIPPR tables give the constants for T in K and p in Pa: they are read as printed
                out[k] = new Dippr101VapourPressure(v[0], v[1], v[2], v[3], v[4], lo, hi);
            } else if (constants == 3) {
                out[k] = new AntoineVapourPressure(v[0], v[1], v[2], perKelvin, offset, pressure.toPascal(1.0), lo,
                        hi);
            } else {
                double tc = tu.toKelvin(v[0]);
                double pc = pressure.toPascal(v[1]);
                if (!(tc > 0) || !(pc > 0)) {
                    throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the critical temperature (in kelvin) and "
                            + "pressure", Numbers.show(tc) + " K and " + Numbers.show(pc) + " Pa");
                }
                out[k] = new WagnerVapourPressure(tc, pc, java.util.Arrays.copyOfRange(v, 2, constants), lo, hi);
            }
        }
        return out;
    }

    /**
     * A component's pure-liquid density: its own 'density model' row, or, for a component the card's mixture-density
     * model covers (every component of a mass-fraction polynomial, every solute of an apparent-volume model), the
     * model's limit, in which case a 'density model' row of its own would be a second, conflicting statement.
     */
    private PureDensity pureDensity(MixtureDensityModel model, int k, List<String> names, Validity validity) {
        boolean covered = model != null
                && !(model instanceof ApparentVolumeDensity && ((ApparentVolumeDensity) model).solvent() == k);
        if (!covered) {
            if (model instanceof ApparentVolumeDensity) {
                return ((ApparentVolumeDensity) model).water();
            }
            return density(names.get(k), validity);
        }
        for (String label : new String[] {DENSITY_MODEL, DENSITY_REFERENCE, DENSITY_COEFFICIENTS}) {
            CardRow own = rows.keyed(label).get(normalise(names.get(k)));
            if (own != null) {
                throw Problem.DENSITY_FROM_MIXTURE_MODEL.raise(own.number, own.label, names.get(k),
                        model.modelName());
            }
        }
        return new ModelLimitDensity(model, k);
    }

    /**
     * The mixture-density model the card states instead of excess-volume coefficients, or null: 'mixture density
     * T0'…'T9' rows (a polynomial in one component's mass fraction and the temperature) or 'apparent density' rows
     * (Laliberté–Cooper, one per solute, with the 'solvent' row naming the water).
     */
    private MixtureDensityModel mixtureDensity(List<String> names, Validity validity) {
        Map<String, CardRow> apparent = rows.keyed(CardLabels.APPARENT_DENSITY);
        CardRow[] terms = new CardRow[CardLabels.MIXTURE_DENSITY_TERMS];
        CardRow anyTerm = null;
        for (int j = 0; j < terms.length; j++) {
            Map<String, CardRow> m = rows.keyed(CardLabels.MIXTURE_DENSITY_TERM + j);
            if (m.size() > 1) {
                CardRow second = new ArrayList<>(m.values()).get(1);
                throw Problem.MODEL_VALUES.raise(second.number, second.label, MassFractionPolynomialDensity.NAME,
                        "one mass fraction, so every 'mixture density' row names the same component",
                        "this row names another");
            }
            terms[j] = m.isEmpty() ? null : m.values().iterator().next();
            anyTerm = anyTerm == null ? terms[j] : anyTerm;
        }
        CardRow reference = rows.global(CardLabels.MIXTURE_DENSITY_REFERENCE);
        if (anyTerm != null && !apparent.isEmpty()) {
            CardRow a = apparent.values().iterator().next();
            throw Problem.MODEL_VALUES.raise(a.number, a.label, ApparentVolumeDensity.NAME, "no 'mixture density' "
                    + "rows", "the card states the mixture's density one way; remove one of them");
        }
        if (anyTerm == null) {
            if (reference != null) {
                throw Problem.MISSING_PAIR_ROW.raise(CardLabels.MIXTURE_DENSITY_REFERENCE, "the mixture",
                        "mixture density T0");
            }
            return apparent.isEmpty() ? null : apparentVolume(names, apparent, validity);
        }
        return polynomial(names, terms, anyTerm, reference);
    }

    private MixtureDensityModel polynomial(List<String> names, CardRow[] terms, CardRow anyTerm, CardRow reference) {
        String name = MassFractionPolynomialDensity.NAME;
        if (names.size() != 2) {
            throw Problem.MODEL_VALUES.raise(anyTerm.number, anyTerm.label, name, "two components",
                    "this card has " + names.size());
        }
        if (terms[0] == null) {
            throw Problem.MISSING_PAIR_ROW.raise("mixture density T0", "the mixture", anyTerm.label);
        }
        if (reference == null) {
            throw Problem.MISSING_ROW.raise(CardLabels.MIXTURE_DENSITY_REFERENCE);
        }
        reference.atMost(1);
        double referenceKelvin = units.temperature().toKelvin(reference.number(0));
        int component = normalise(names.get(0)).equals(normalise(anyTerm.text(0))) ? 0 : 1;
        int last = terms.length - 1;
        while (terms[last] == null) {
            last--;
        }
        double[][] a = new double[last + 1][];
        for (int j = 0; j <= last; j++) {
            if (terms[j] == null) {
                a[j] = new double[0];
                continue;
            }
            a[j] = terms[j].numbersFrom(1);
            for (int i = 0; i < a[j].length; i++) {
                a[j][i] = units.temperature().toPerKelvin(units.density().toKgPerM3(a[j][i]), j);
            }
        }
        return new MassFractionPolynomialDensity(component, referenceKelvin, a);
    }

    private MixtureDensityModel apparentVolume(List<String> names, Map<String, CardRow> apparent,
            Validity validity) {
        int solvent = solvent(names);
        double[][] c = soluteParameters(names, solvent, apparent, ApparentVolumeDensity.NAME, 5,
                "five parameters c0 to c4");
        return new ApparentVolumeDensity(solvent, density(names.get(solvent), validity), c);
    }

    /**
     * The parameters of a solution model's rows, one row per solute naming the model ({@code model}, compared as
     * {@link #sameKeyword} does) and then {@code count} numbers (any number when {@code count} &lt; 0); null at the
     * solvent, which must have no such row.
     */
    private static double[][] soluteParameters(List<String> names, int solvent, Map<String, CardRow> byComponent,
            String model, int count, String takes) {
        double[][] out = new double[names.size()][];
        for (int k = 0; k < names.size(); k++) {
            CardRow r = byComponent.get(normalise(names.get(k)));
            if (k == solvent) {
                if (r != null) {
                    throw Problem.SOLVENT_WITH_SOLUTION_MODEL.raise(r.number, r.label, names.get(k));
                }
                continue;
            }
            if (r == null) {
                throw Problem.NO_SOLUTION_MODEL.raise(names.get(solvent), names.get(k));
            }
            if (!sameKeyword(r.text(1), model)) {
                throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(1).trim(), model);
            }
            out[k] = r.numbersFrom(2);
            if (count >= 0 && out[k].length != count) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, model, takes, "found " + out[k].length);
            }
        }
        return out;
    }

    /** The component the 'solvent' row names (the water of a solution model); refused when the row is missing. */
    private int solvent(List<String> names) {
        CardRow solventRow = rows.global(CardLabels.SOLVENT);
        if (solventRow == null) {
            throw Problem.MISSING_ROW.raise(CardLabels.SOLVENT);
        }
        solventRow.atMost(1);
        String solventName = solventRow.text(0).trim();
        for (int k = 0; k < names.size(); k++) {
            if (normalise(names.get(k)).equals(normalise(solventName))) {
                return k;
            }
        }
        throw Problem.UNKNOWN_COMPONENT.raise(solventRow.number, solventRow.label, solventName);
    }

    /**
     * Whether a model's name as typed is this one: compared as labels are, and also with the accents dropped and any
     * dash or hyphen taken alike ("Laliberte-Cooper 2004" is "Laliberté–Cooper 2004").
     */
    static boolean sameKeyword(String typed, String name) {
        return plain(typed).equals(plain(name));
    }

    private static String plain(String s) {
        String n = java.text.Normalizer.normalize(normalise(s), java.text.Normalizer.Form.NFD)
                .replaceAll("\\p{M}", "");
        return n.replaceAll("\\s*[-\u2010-\u2015]\\s*", "-");
    }

    /**
     * The boiling temperatures a two-component card states: one 'boiling temperatures' row naming the component
     * whose mole fraction the points give, then pairs of mole fraction and temperature (card unit), the mole
     * fractions strictly increasing within 0..1; null when the card states none.
     */
    private BoilingCurve boilingCurve(List<String> names) {
        Map<String, CardRow> curves = rows.keyed(CardLabels.BOILING);
        if (curves.isEmpty()) {
            return null;
        }
        CardRow r = curves.values().iterator().next();
        if (curves.size() > 1 || names.size() != 2) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, "boiling temperature", "one row on a card of two "
                    + "components", "the mole fraction of one component does not fix a blend of more");
        }
        int component = normalise(names.get(0)).equals(normalise(r.text(0))) ? 0 : 1;
        double[] v = r.numbersFrom(1);
        if (v.length < 4 || v.length % 2 != 0) {
            throw Problem.MODEL_VALUES.raise(r.number, r.label, "boiling temperature", "pairs of mole fraction and "
                    + "temperature, at least two", "found " + v.length + " value(s)");
        }
        double[] x = new double[v.length / 2];
        double[] kelvin = new double[v.length / 2];
        for (int i = 0; i < x.length; i++) {
            x[i] = v[2 * i];
            kelvin[i] = units.temperature().toKelvin(v[2 * i + 1]);
            if (x[i] < 0.0 || x[i] > 1.0 || (i > 0 && !(x[i] > x[i - 1]))) {
                throw Problem.MODEL_VALUES.raise(r.number, r.label, "boiling temperature", "mole fractions "
                        + "increasing within 0 to 1", "found " + Numbers.show(x[i]) + " in column " + (3 + 2 * i));
            }
            if (!(kelvin[i] > 0.0)) {
                throw Problem.NOT_POSITIVE.raise(r.number, r.label, "a boiling temperature (in kelvin)",
                        Numbers.show(kelvin[i]));
            }
        }
        return new BoilingCurve(component, x, kelvin);
    }

    /**
     * The solution heat-capacity model (Laliberté 2009) the card states with 'solution heat capacity' rows, one per
     * solute, and the 'solvent' row naming the water; null when it states none.
     */
    private SolutionHeatCapacity solutionHeatCapacity(List<String> names, List<Double> masses) {
        Map<String, CardRow> solutes = rows.keyed(CardLabels.SOLUTION_HEAT_CAPACITY);
        CardRow solventRow = rows.global(CardLabels.SOLVENT);
        if (solutes.isEmpty()) {
            if (solventRow != null && rows.keyed(CardLabels.APPARENT_DENSITY).isEmpty()
                    && rows.keyed(CardLabels.OSMOTIC).isEmpty()) {
                throw Problem.MISSING_PAIR_ROW.raise(CardLabels.SOLVENT, "the solution",
                        CardLabels.SOLUTION_HEAT_CAPACITY);
            }
            return null;
        }
        int solvent = solvent(names);
        double[][] a = soluteParameters(names, solvent, solutes, "Laliberté 2009", 6, "six parameters a1 to a6");
        ApparentHeatCapacity[] apparent = new ApparentHeatCapacity[names.size()];
        double[] molarMass = new double[names.size()];
        for (int k = 0; k < names.size(); k++) {
            molarMass[k] = masses.get(k);
            apparent[k] = k == solvent ? null : new ApparentHeatCapacity(a[k]);
        }
        return new SolutionHeatCapacity(solvent, molarMass, apparent);
    }

    private ExcessFunction section(String prefix, double factor, Subjects subjects, GeometricModel model,
            int asymmetric, boolean missingIdeal) {
        return new ExcessSectionBuilder(rows.section(prefix), subjects, units.temperature(), factor)
                .build(model, asymmetric, missingIdeal);
    }

    /** The component's heat capacity, or null when the card gives none. */
    private HeatCapacity heatCapacity(String name) {
        String subject = normalise(name);
        CardRow r = rows.keyed(HEAT_CAPACITY).get(subject);
        CardRow reference = rows.keyed(HEAT_CAPACITY_REFERENCE).get(subject);
        if (r == null) {
            if (reference != null) {
                throw Problem.MISSING_PAIR_ROW.raise(HEAT_CAPACITY_REFERENCE, name, HEAT_CAPACITY);
            }
            return null;
        }
        if (units.enthalpy() == null) {
            throw Problem.MISSING_ROW.raise(ENTHALPY_UNIT);
        }
        double[] c = r.numbersFrom(1);
        for (int j = 0; j < c.length; j++) {
            // per degree of the card's scale (Cp itself) times per degree^j (its temperature polynomial)
            c[j] = units.temperature().toPerKelvin(units.enthalpy().toJoulePerMol(c[j]), j + 1);
        }
        double tRef = 298.15; // irrelevant for a constant heat capacity
        if (reference != null) {
            reference.atMost(2);
            tRef = units.temperature().toKelvin(reference.number(1));
        } else if (c.length > 1) {
            throw Problem.MISSING_PAIR_ROW.raise(HEAT_CAPACITY, name, HEAT_CAPACITY_REFERENCE);
        }
        return new HeatCapacity(tRef, c);
    }

    /**
     * The multicomponent model, Muggianu's when the row is absent; for Toop's, the asymmetric component goes into
     * {@code asymmetric[0]}.
     */
    private GeometricModel model(Subjects subjects, int[] asymmetric) {
        CardRow r = rows.global(MODEL);
        if (r == null) {
            return GeometricModel.MUGGIANU;
        }
        String kind = normalise(r.text(0));
        for (GeometricModel m : GeometricModel.values()) {
            if (kind.equals(normalise(m.cardName()))) {
                if (m == GeometricModel.TOOP) {
                    r.atMost(2);
                    String a = r.text(1).trim();
                    asymmetric[0] = subjects.indexOf(a);
                    if (asymmetric[0] < 0) {
                        throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, a);
                    }
                } else {
                    r.atMost(1);
                }
                return m;
            }
        }
        throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(0).trim(), "Muggianu, Kohler, Toop");
    }

    /**
     * A global yes/no row: true for the word {@code yes}, false for {@code no} or when the row is absent (both
     * words compared as labels are).
     */
    private boolean choice(String label, String yes, String no) {
        CardRow r = rows.global(label);
        if (r == null) {
            return false;
        }
        r.atMost(1);
        String v = normalise(r.text(0));
        if (v.equals(yes)) {
            return true;
        }
        if (v.equals(no)) {
            return false;
        }
        throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(0).trim(), no + ", " + yes);
    }

    /**
     * The 'component order' row, when the card has one: its names, in its columns, must be the 'component' rows'
     * names in their order. A sort moves rows but not the cells within a row, so a sorted card fails here.
     */
    private void checkOrder(List<String> names) {
        CardRow r = rows.global(COMPONENT_ORDER);
        if (r == null) {
            return;
        }
        List<String> stated = new ArrayList<>();
        boolean same = r.values.length == names.size();
        for (int i = 0; i < Math.max(r.values.length, 1); i++) {
            String s = r.text(i).trim();
            stated.add(s);
            same &= i < names.size() && normalise(s).equals(normalise(names.get(i)));
        }
        if (!same) {
            throw Problem.COMPONENT_ORDER.raise(r.number, r.label, quoted(stated), quoted(names));
        }
    }

    /** Names as a message lists them: "a", "b", "c". */
    private static String quoted(List<String> names) {
        StringBuilder b = new StringBuilder();
        for (String n : names) {
            b.append(b.length() == 0 ? "" : ", ").append('"').append(n).append('"');
        }
        return b.toString();
    }

    /** Every keyed row must name a declared component (or, for excess rows, a pair of them). */
    private void checkSubjects(Map<String, CardRow> componentRows) {
        for (Map.Entry<String, LinkedHashMap<String, CardRow>> e : rows.keyed().entrySet()) {
            if (e.getKey().equals(COMPONENT) || CardLabels.isSectionRow(e.getKey())
                    || CardLabels.isPairKeyed(e.getKey())) {
                continue;
            }
            for (Map.Entry<String, CardRow> s : e.getValue().entrySet()) {
                if (!componentRows.containsKey(s.getKey())) {
                    CardRow r = s.getValue();
                    throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, r.text(0).trim());
                }
            }
        }
    }

    /** The pure liquid's density model, checked positive over the validity range. */
    private PureDensity density(String name, Validity validity) {
        String subject = normalise(name);
        CardRow model = rows.keyed(DENSITY_MODEL).get(subject);
        if (model == null) {
            throw Problem.MISSING_DENSITY.raise(name);
        }
        model.atMost(2);
        CardRow reference = rows.keyed(DENSITY_REFERENCE).get(subject);
        CardRow coefficients = rows.keyed(DENSITY_COEFFICIENTS).get(subject);
        String kind = normalise(model.text(1));
        PureDensity d;
        if (kind.equals(ConstantDensity.NAME)) {
            if (reference != null) {
                throw Problem.MODEL_VALUES.raise(reference.number, reference.label, ConstantDensity.NAME,
                        "no reference temperature", "remove this row");
            }
            if (coefficients == null) {
                throw Problem.MODEL_VALUES.raise(model.number, model.label, ConstantDensity.NAME,
                        "one value in a 'density coefficients' row", "that row is missing");
            }
            coefficients.atMost(2);
            d = new ConstantDensity(units.density().toKgPerM3(coefficients.number(1)));
        } else if (kind.equals(PolynomialDensity.NAME)) {
            if (reference == null || coefficients == null) {
                throw Problem.MODEL_VALUES.raise(model.number, model.label, PolynomialDensity.NAME,
                        "a 'density reference temperature' row and a 'density coefficients' row",
                        "one of them is missing");
            }
            reference.atMost(2);
            double tRef = units.temperature().toKelvin(reference.number(1));
            double[] c = coefficients.numbersFrom(1);
            for (int j = 0; j < c.length; j++) {
                c[j] = units.temperature().toPerKelvin(units.density().toKgPerM3(c[j]), j);
            }
            d = new PolynomialDensity(tRef, c);
        } else if (kind.equals(normalise(Tanaka2001WaterDensity.NAME))) {
            CardRow extra = reference != null ? reference : coefficients;
            if (extra != null) {
                throw Problem.MODEL_VALUES.raise(extra.number, extra.label, Tanaka2001WaterDensity.NAME,
                        "no coefficients or reference temperature", "remove this row");
            }
            d = Tanaka2001WaterDensity.INSTANCE;
        } else if (kind.equals(normalise(Dippr105Density.NAME))) {
            if (reference != null) {
                throw Problem.MODEL_VALUES.raise(reference.number, reference.label, Dippr105Density.NAME,
                        "no reference temperature", "remove this row");
            }
            if (coefficients == null) {
                throw Problem.MODEL_VALUES.raise(model.number, model.label, Dippr105Density.NAME,
                        "C1 to C4 in a 'density coefficients' row", "that row is missing");
            }
            double[] c = coefficients.numbersFrom(1);
            if (c.length != 4) {
                throw Problem.MODEL_VALUES.raise(coefficients.number, coefficients.label, Dippr105Density.NAME,
                        "four coefficients C1 to C4 (C1 in mol/dm³, C3 in K, as the tables print them)",
                        "found " + c.length);
            }
            d = new Dippr105Density(c[0], c[1], c[2], c[3], molarMasses.get(subject));
        } else if (kind.equals(TabulatedDensity.NAME)) {
            if (reference != null) {
                throw Problem.MODEL_VALUES.raise(reference.number, reference.label, TabulatedDensity.NAME,
                        "no reference temperature", "remove this row");
            }
            if (coefficients == null) {
                throw Problem.MODEL_VALUES.raise(model.number, model.label, TabulatedDensity.NAME,
                        "pairs of temperature and density in a 'density coefficients' row", "that row is missing");
            }
            double[] v = coefficients.numbersFrom(1);
            if (v.length < 4 || v.length % 2 != 0) {
                throw Problem.MODEL_VALUES.raise(coefficients.number, coefficients.label, TabulatedDensity.NAME,
                        "pairs of temperature and density, at least two", "found " + v.length + " value(s)");
            }
            double[] kelvin = new double[v.length / 2];
            double[] rho = new double[v.length / 2];
            for (int i = 0; i < kelvin.length; i++) {
                kelvin[i] = units.temperature().toKelvin(v[2 * i]);
                rho[i] = units.density().toKgPerM3(v[2 * i + 1]);
                if (i > 0 && !(kelvin[i] > kelvin[i - 1])) {
                    throw Problem.MODEL_VALUES.raise(coefficients.number, coefficients.label, TabulatedDensity.NAME,
                            "temperatures increasing from pair to pair", "found " + Numbers.show(v[2 * i])
                                    + " after " + Numbers.show(v[2 * i - 2]));
                }
            }
            d = new TabulatedDensity(kelvin, rho);
        } else if (kind.equals(normalise(Kell1975WaterDensity.NAME))) {
            CardRow extra = reference != null ? reference : coefficients;
            if (extra != null) {
                throw Problem.MODEL_VALUES.raise(extra.number, extra.label, Kell1975WaterDensity.NAME,
                        "no coefficients or reference temperature", "remove this row");
            }
            d = Kell1975WaterDensity.INSTANCE;
        } else {
            throw Problem.BAD_KEYWORD.raise(model.number, model.label, model.text(1),
                    ConstantDensity.NAME + ", " + PolynomialDensity.NAME + ", " + Tanaka2001WaterDensity.NAME + ", "
                            + Kell1975WaterDensity.NAME + ", " + Dippr105Density.NAME + ", " + TabulatedDensity.NAME);
        }
        double lo = validity.lowestKelvin();
        double hi = validity.highestKelvin();
        if (lo < d.lowestKelvin() || hi > d.highestKelvin()) {
            throw Problem.MODEL_RANGE.raise(model.number, model.label, d.modelName(),
                    Numbers.show(d.lowestKelvin()), Numbers.show(d.highestKelvin()), Numbers.show(lo),
                    Numbers.show(hi));
        }
        // A polynomial can dip below zero between widely spaced points, so sample the range finely.
        CardRow cause = coefficients != null ? coefficients : model;
        for (int s = 0; s <= DENSITY_SAMPLES; s++) {
            double t = s == DENSITY_SAMPLES ? hi : lo + (hi - lo) * s / DENSITY_SAMPLES;
            double rho = d.at(t);
            if (!(rho > 0) || Double.isInfinite(rho)) {
                throw Problem.DENSITY_NOT_POSITIVE.raise(cause.number, cause.label, name, Numbers.show(rho),
                        Numbers.show(t));
            }
        }
        return d;
    }

    /** A global unit row: one known spelling of this kind of unit. */
    private <E extends Enum<E> & Units.Spelled> E unit(String label, Class<E> type) {
        CardRow r = rows.required(label);
        r.atMost(1);
        E e = Units.lookup(type, r.text(0));
        if (e == null) {
            throw Problem.UNKNOWN_UNIT.raise(r.number, r.label, r.text(0).trim(), Units.accepted(type));
        }
        return e;
    }
}
