package org.miscela.core.card;

import org.miscela.core.model.VapourPressure;
import org.miscela.core.model.BoilingCurve;
import org.miscela.core.model.Component;
import org.miscela.core.model.DensityModelVolume;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.ExcessModel;
import org.miscela.core.model.MixtureDensityModel;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.PitzerOsmotic;
import org.miscela.core.model.SolutionHeatCapacity;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * A parsed card: components with their pure-liquid data, the excess volume (and optionally excess enthalpy) of the
 * mixture as binary Redlich–Kister sets combined by a geometric model, units, validity range and source. Immutable;
 * build one with {@link CardReader}.
 */
public final class Card {
    private final String title;
    private final String source;
    private final Units units;
    private final List<Component> components;
    private final ExcessFunction excessVolume;
    private final ExcessFunction excessEnthalpy;
    private final Validity validity;
    private final boolean extrapolationAllowed;
    private final boolean missingPairsIdeal;
    private final Mixture mixture;
    /** The reference temperature of the volume-based bases the card states (K), or NaN when it states none. */
    private final double statedBasisReferenceKelvin;
    /** The solution heat-capacity model the card states, or null. */
    private final SolutionHeatCapacity solutionHeatCapacity;
    /** The boiling temperatures the card states, or null. */
    private final BoilingCurve boiling;
    /** The mixture-density model the card states instead of excess-volume coefficients, or null. */
    private final MixtureDensityModel densityModel;
    /** The excess volume: the Redlich–Kister section, the one the density model implies, or null. */
    private final ExcessModel volumeModel;
    /** G^E/RT (dimensionless): Redlich–Kister sets or a local-composition model, or null. */
    private final ExcessModel excessGibbs;
    /** Each component's vapour pressure, null where the card gives none; null when it gives none at all. */
    private final VapourPressure[] vapourPressures;
    /** The unit of pressures on the card and in the functions, or null when the card states none. */
    private final Units.Pressure pressureUnit;
    private final double[] flashKelvin;
    private final String[] flashMethod;
    private final double[] lowerFlammableLimit;
    /** The molar volumes of 'Wilson volume' rows (cm³/mol; NaN for a component without one), or null. */
    private final double[] wilsonVolumes;
    private final Fusion[] fusion;
    private final PitzerOsmotic osmotic;

    /**
     * 20 °C, the temperature at which alcoholic strength by volume is defined (OIML R 22 (1975)), used for every
     * basis measured per volume of mixture (%vol, mol/L, g/L) unless the card or the call states another.
     */
    public static final double DEFAULT_BASIS_REFERENCE_KELVIN = 293.15;

    /** A volumetric card combined by Muggianu's model; {@code excessVolume[i][j]} for i &lt; j, written i then j. */
    Card(String title, String source, Units units, List<Component> components, RedlichKister[][] excessVolume,
            Validity validity, boolean extrapolationAllowed) {
        this(title, source, units, components, new ExcessFunction(components.size(), GeometricModel.MUGGIANU, -1,
                excessVolume, Collections.<TernaryTerm>emptyList()), null, validity, extrapolationAllowed, false);
    }

    /**
     * @param excessVolume null for a card that describes enthalpy only
     * @param excessEnthalpy null when the card holds no enthalpy data
     */
    Card(String title, String source, Units units, List<Component> components, ExcessFunction excessVolume,
            ExcessFunction excessEnthalpy, Validity validity, boolean extrapolationAllowed,
            boolean missingPairsIdeal) {
        this(title, source, units, components, excessVolume, excessEnthalpy, validity, extrapolationAllowed,
                missingPairsIdeal, Double.NaN, null, null, null, null);
    }

    /**
     * @param statedBasisReferenceKelvin the card's 'basis reference temperature' in K, or NaN when it has none
     * @param solutionHeatCapacity the solution heat-capacity model the card states, or null
     * @param boiling the boiling temperatures the card states, or null
     * @param densityModel the mixture-density model the card states (then {@code excessVolume} is null), or null
     * @param phase the phase-equilibrium data, or null
     */
    Card(String title, String source, Units units, List<Component> components, ExcessFunction excessVolume,
            ExcessFunction excessEnthalpy, Validity validity, boolean extrapolationAllowed,
            boolean missingPairsIdeal, double statedBasisReferenceKelvin, SolutionHeatCapacity solutionHeatCapacity,
            BoilingCurve boiling, MixtureDensityModel densityModel, PhaseData phase) {
        this.title = title;
        this.source = source;
        this.units = units;
        this.components = Collections.unmodifiableList(new ArrayList<>(components));
        this.excessVolume = excessVolume;
        this.excessEnthalpy = excessEnthalpy;
        this.validity = validity;
        this.extrapolationAllowed = extrapolationAllowed;
        this.missingPairsIdeal = missingPairsIdeal;
        this.statedBasisReferenceKelvin = statedBasisReferenceKelvin;
        this.solutionHeatCapacity = solutionHeatCapacity;
        this.boiling = boiling;
        this.densityModel = densityModel;
        this.excessGibbs = phase == null ? null : phase.gibbs;
        this.vapourPressures = phase == null || phase.vapour == null ? null : phase.vapour.clone();
        this.pressureUnit = phase == null ? null : phase.pressure;
        this.wilsonVolumes = phase == null || phase.wilsonVolumes == null ? null : phase.wilsonVolumes.clone();
        this.flashKelvin = phase == null || phase.flashKelvin == null ? null : phase.flashKelvin.clone();
        this.flashMethod = phase == null || phase.flashMethod == null ? null : phase.flashMethod.clone();
        this.lowerFlammableLimit = phase == null || phase.lowerFlammableLimit == null ? null
                : phase.lowerFlammableLimit.clone();
        this.fusion = phase == null || phase.fusion == null ? null : phase.fusion.clone();
        this.osmotic = phase == null ? null : phase.osmotic;
        if (densityModel != null && excessVolume != null) {
            throw new IllegalArgumentException("a card states its volumes one way");
        }
        if (densityModel != null) {
            double[] masses = new double[components.size()];
            for (int k = 0; k < masses.length; k++) {
                masses[k] = components.get(k).molarMass();
            }
            this.volumeModel = new DensityModelVolume(densityModel, masses);
        } else {
            this.volumeModel = excessVolume;
        }
        this.mixture = new Mixture(this);
    }

    public String title() {
        return title;
    }

    public String source() {
        return source;
    }

    public Units units() {
        return units;
    }

    public List<Component> components() {
        return components;
    }

    public int componentCount() {
        return components.size();
    }

    /** Index (0-based) of the component with this name, ignoring case, or −1. */
    public int indexOf(String name) {
        String n = name.trim();
        for (int i = 0; i < components.size(); i++) {
            if (components.get(i).name().equalsIgnoreCase(n)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * The excess-volume expansion of components i and j, written in that order (internal units, cm³/mol), or null
     * when the card treats the pair as ideal.
     */
    public RedlichKister excessVolume(int i, int j) {
        return excessVolume == null ? null : excessVolume.pair(i, j);
    }

    /**
     * The multicomponent excess volume as Redlich–Kister sets (cm³/mol), or null for a card that describes enthalpy
     * only or states a mixture-density model instead ({@link #volumeModel} covers both).
     */
    public ExcessFunction excessVolume() {
        return excessVolume;
    }

    /**
     * The excess volume whatever its form (cm³/mol): the Redlich–Kister section or the one the card's mixture-density
     * model implies; null for a card that describes enthalpy only.
     */
    public ExcessModel volumeModel() {
        return volumeModel;
    }

    /** The mixture-density model the card states (OIML R 22 form, Laliberté–Cooper), or null. */
    public MixtureDensityModel densityModel() {
        return densityModel;
    }

    /** The multicomponent excess enthalpy (J/mol), or null when the card holds none. */
    public ExcessFunction excessEnthalpy() {
        return excessEnthalpy;
    }

    /** Whether pairs without coefficient rows are ideal (the card's 'missing pairs | ideal'). */
    public boolean missingPairsIdeal() {
        return missingPairsIdeal;
    }

    /**
     * The reference temperature of the volume-based bases (%vol, mol/L, g/L), in the card's temperature unit: the
     * card's 'basis reference temperature' row, or 20 °C (OIML R 22) when it has none.
     */
    public double basisReferenceTemperature() {
        return units.temperature().fromKelvin(statesBasisReference() ? statedBasisReferenceKelvin
                : DEFAULT_BASIS_REFERENCE_KELVIN);
    }

    /** Whether the card states its basis reference temperature (rather than taking the 20 °C default). */
    public boolean statesBasisReference() {
        return !Double.isNaN(statedBasisReferenceKelvin);
    }

    /** The solution heat-capacity model (Laliberté 2009) the card states, or null when it states none. */
    public SolutionHeatCapacity solutionHeatCapacity() {
        return solutionHeatCapacity;
    }

    /** The boiling temperatures the card states, or null when it states none. */
    public BoilingCurve boiling() {
        return boiling;
    }

    /** What a card states about phase equilibrium: G^E/RT, vapour pressures, the pressure unit (each may be null). */
    static final class PhaseData {
        final ExcessModel gibbs;
        final VapourPressure[] vapour;
        final Units.Pressure pressure;
        final double[] wilsonVolumes;
        /** Each component's flash point in K: NaN without a row, +∞ for one that does not flash. */
        final double[] flashKelvin;
        /** Each flash point's test method as the card writes it (null without a row). */
        final String[] flashMethod;
        /** Each component's lower flammable limit as a volume fraction of the air mixture (NaN without a row). */
        final double[] lowerFlammableLimit;
        final Fusion[] fusion;
        /** The water's activity by Pitzer's osmotic coefficient, or null. */
        final PitzerOsmotic osmotic;

        PhaseData(ExcessModel gibbs, VapourPressure[] vapour, Units.Pressure pressure, double[] wilsonVolumes,
                double[] flashKelvin, String[] flashMethod, double[] lowerFlammableLimit, Fusion[] fusion,
                PitzerOsmotic osmotic) {
            this.osmotic = osmotic;
            this.gibbs = gibbs;
            this.vapour = vapour;
            this.pressure = pressure;
            this.wilsonVolumes = wilsonVolumes;
            this.flashKelvin = flashKelvin;
            this.flashMethod = flashMethod;
            this.lowerFlammableLimit = lowerFlammableLimit;
            this.fusion = fusion;
        }
    }

    /** Component k's melting data ('melting point', 'enthalpy of fusion' rows), or null when the card gives none. */
    public Fusion fusion(int k) {
        return fusion == null ? null : fusion[k];
    }

    /** The water's activity by Pitzer's osmotic coefficient ('osmotic coefficient' row), or null. */
    public PitzerOsmotic osmotic() {
        return osmotic;
    }

    /** G^E/RT of the liquid (dimensionless), or null when the card gives none. */
    public ExcessModel excessGibbs() {
        return excessGibbs;
    }

    /** Component k's vapour pressure, or null when the card gives none for it. */
    public VapourPressure vapourPressure(int k) {
        return vapourPressures == null ? null : vapourPressures[k];
    }

    /**
     * The molar volume (cm³/mol) of component k's 'Wilson volume' row, or NaN when it has none: the volumes Λ uses,
     * also read from the pure part of a card that a Wilson fit is given.
     */
    public double wilsonVolume(int k) {
        return wilsonVolumes == null ? Double.NaN : wilsonVolumes[k];
    }

    /**
     * Component k's closed-cup flash point in K from its 'flash point' row: NaN when the card has no such row for it,
     * positive infinity when the row says it does not flash ("none").
     */
    public double flashPointKelvin(int k) {
        return flashKelvin == null ? Double.NaN : flashKelvin[k];
    }

    /**
     * Component k's lower flammable limit in air as a volume fraction, from its 'lower flammable limit' row, or NaN
     * when the card has none.
     */
    public double lowerFlammableLimit(int k) {
        return lowerFlammableLimit == null ? Double.NaN : lowerFlammableLimit[k];
    }

    /** The test method the card gives with component k's flash point, or null. */
    public String flashPointMethod(int k) {
        return flashMethod == null ? null : flashMethod[k];
    }

    /** The card's pressure unit, or null when it states none. */
    public Units.Pressure pressureUnit() {
        return pressureUnit;
    }

    /**
     * The component the card's 'solvent' row names (the water of a solution model: apparent density, solution heat
     * capacity or osmotic coefficient), or −1 on a card without one.
     */
    public int solventIndex() {
        if (osmotic != null) {
            return osmotic.solvent();
        }
        if (densityModel instanceof org.miscela.core.model.ApparentVolumeDensity) {
            return ((org.miscela.core.model.ApparentVolumeDensity) densityModel).solvent();
        }
        return solutionHeatCapacity == null ? -1 : solutionHeatCapacity.solvent();
    }

    /** Whether component k's pure liquid is only a limit of the card's mixture-density model (a dissolved salt). */
    public boolean hypotheticalPure(int k) {
        return densityModel != null && densityModel.hypotheticalPure(k);
    }

    /** Refuses, with words, a use of component k's pure-liquid density or volume when its pure liquid is hypothetical. */
    public void requireRealPure(int k) {
        if (hypotheticalPure(k)) {
            String solvent = "water";
            for (int j = 0; j < components.size(); j++) {
                if (!densityModel.hypotheticalPure(j)) {
                    solvent = components.get(j).name();
                }
            }
            throw Problem.PURE_HYPOTHETICAL.raise(densityModel.modelName(), components.get(k).name(), solvent);
        }
    }

    /** The calculator for any number of components. */
    public Mixture mixture() {
        return mixture;
    }

    public Validity validity() {
        return validity;
    }

    public boolean extrapolationAllowed() {
        return extrapolationAllowed;
    }

    /** Whether this evaluation may leave the validity range. */
    public boolean mayExtrapolate(Extrapolation e) {
        return e == Extrapolation.ALLOW || (e == Extrapolation.AS_CARD && extrapolationAllowed);
    }

    /** Component names joined for messages. */
    public String componentNames() {
        StringBuilder b = new StringBuilder();
        for (Component c : components) {
            if (b.length() > 0) {
                b.append(", ");
            }
            b.append(c.name());
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Card[%s; %s]", title, componentNames());
    }
}
