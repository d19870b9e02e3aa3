package org.miscela.calc.meta;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

/**
 * The single source of truth for every cell function's user-facing metadata. The wizard's CalcAddIns.xcu and
 * docs/functions.md are generated from this list; tests check it against the IDL and the implementation.
 */
public final class FunctionCatalog {
    /** The UNO service: permanent, written into every saved workbook. */
    public static final String SERVICE = "org.miscela.calc.MixtureFunctions";
    /** Calc's fixed category names allow no category of our own; "Add-In" is where extension functions belong. */
    static final String CATEGORY = "Add-In";

    private static final ArgumentInfo CARD = required("card", "card",
            "The named range holding the mixture's card: labels in the first column, values to their right.");
    private static final ArgumentInfo MOLE_FRACTION = required("moleFraction", "x1",
            "Mole fraction of the card's first component, 0 to 1. A single value, or a range for an array result.");
    private static final ArgumentInfo TEMPERATURE = required("temperature", "temperature",
            "Temperature in the card's temperature unit. A single value, or a range of the same shape as x1.");
    private static final ArgumentInfo EXTRAPOLATE = optional("extrapolate", "extrapolate",
            "Optional. TRUE accepts a result outside the card's validity range; FALSE refuses it; "
                    + "left out, the card's 'extrapolation' row decides (refuse when absent).");
    private static final ArgumentInfo MOLE_FRACTION_ONE = required("moleFraction", "x1",
            "Mole fraction of the card's first component, 0 to 1 (one value).");
    private static final ArgumentInfo TEMPERATURE_ONE = required("temperature", "temperature",
            "Temperature in the card's temperature unit (one value).");
    private static final ArgumentInfo COMPONENT = required("component", "component",
            "The component: its number on the card (1 for the first) or its name as written on the card.");

    private static final List<FunctionInfo> FUNCTIONS = Collections.unmodifiableList(Arrays.asList(
            new FunctionInfo("excessMolarVolume", "MIX.EXCESSVOLUME",
                    "Excess molar volume of a binary mixture from the card's Redlich–Kister coefficients, "
                            + "in the card's molar volume unit.",
                    "V^E = x1·x2·Σ_k A_k(T)·(x1 − x2)^k, A_k(T) = Σ_j a_kj·(T − T_ref)^j (Redlich & Kister 1948)",
                    "=MIX.EXCESSVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE),
            new FunctionInfo("partialMolarVolume", "MIX.PARTIALVOLUME",
                    "Partial molar volume of one component of a binary mixture, in the card's molar volume unit.",
                    "V̄_1 = V_1* + V^E + x2·dV^E/dx1; V̄_2 = V_2* + V^E − x1·dV^E/dx1",
                    "=MIX.PARTIALVOLUME(card; 1; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE),
            new FunctionInfo("partialExcessMolarVolume", "MIX.PARTIALEXCESS",
                    "Partial molar excess volume of one component of a binary mixture "
                            + "(its partial molar volume less its pure molar volume), in the card's molar volume unit.",
                    "V̄_1^E = V^E + x2·dV^E/dx1; V̄_2^E = V^E − x1·dV^E/dx1",
                    "=MIX.PARTIALEXCESS(card; \"water\"; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE),
            new FunctionInfo("mixtureMolarVolume", "MIX.MOLARVOLUME",
                    "Molar volume of a binary mixture (volume per mole of mixture), in the card's molar volume unit.",
                    "V_m = x1·V_1* + x2·V_2* + V^E, V_k* = M_k / ρ_k(T)",
                    "=MIX.MOLARVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE),
            new FunctionInfo("mixtureDensity", "MIX.DENSITY",
                    "Density of a binary mixture, in the card's density unit.",
                    "ρ = (x1·M_1 + x2·M_2) / V_m",
                    "=MIX.DENSITY(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE),
            new FunctionInfo("pureDensity", "MIX.PUREDENSITY",
                    "Density of one pure component from its model on the card, in the card's density unit.",
                    "constant: ρ = c0; polynomial: ρ = Σ_j c_j·(T − T_ref)^j; Tanaka 2001: the CIPM water formula",
                    "=MIX.PUREDENSITY(card; \"water\"; 20)",
                    CARD, COMPONENT, required("temperature", "temperature",
                            "Temperature in the card's temperature unit. A single value, or a range for an array "
                                    + "result."), EXTRAPOLATE),
            new FunctionInfo("checkCard", "MIX.CHECK",
                    "\"OK\" when the card can be read and used; otherwise its first problem, naming the row.",
                    "—",
                    "=MIX.CHECK(card)",
                    CARD),
            new FunctionInfo("checkPoint", "MIX.CHECKPOINT",
                    "\"OK\" when the functions can answer at this composition and temperature; otherwise why they "
                            + "refuse (for example the validity limit that is exceeded).",
                    "—",
                    "=MIX.CHECKPOINT(card; 0.3; 45)",
                    CARD, MOLE_FRACTION_ONE, TEMPERATURE_ONE, EXTRAPOLATE)));

    private FunctionCatalog() {
    }

    /** Every function, in the order of the IDL interface. */
    public static List<FunctionInfo> functions() {
        return FUNCTIONS;
    }

    /** The function with this IDL method name. */
    public static FunctionInfo byMethod(String method) {
        for (FunctionInfo f : FUNCTIONS) {
            if (f.method().equals(method)) {
                return f;
            }
        }
        throw new IllegalArgumentException("no function " + method);
    }

    private static ArgumentInfo required(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, false);
    }

    private static ArgumentInfo optional(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, true);
    }
}
