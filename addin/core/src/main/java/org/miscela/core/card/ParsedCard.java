package org.miscela.core.card;

import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A card's rows as {@link CardGrammar} sorted them, before any value is interpreted: the global rows by label, the
 * keyed rows by label and subject, and the rows of each excess-property section by kind. A label appears once per
 * card (per subject, for keyed rows): a second row is refused here, naming both rows.
 */
final class ParsedCard {
    private final int version;
    private final Map<String, CardRow> global = new HashMap<>();
    /** keyed rows: key → (normalised subject → row), in card order */
    private final Map<String, LinkedHashMap<String, CardRow>> keyed = new HashMap<>();
    /** excess-property sections by prefix ("excess volume", "excess enthalpy"), in the order first seen */
    private final Map<String, Section> sections = new LinkedHashMap<>();

    ParsedCard(int version) {
        this.version = version;
    }

    /** The format version of the header, 1 or 2. */
    int version() {
        return version;
    }

    void putGlobal(CardRow r) {
        CardRow before = global.put(r.key, r);
        if (before != null) {
            throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
        }
    }

    /** Files a keyed row under its label and subject (column 2, which must be text). */
    void putKeyed(CardRow r) {
        String subject = CardReader.normalise(r.text(0));
        CardRow before = keyed.computeIfAbsent(r.key, k -> new LinkedHashMap<>()).put(subject, r);
        if (before != null) {
            throw Problem.DUPLICATE_ROW.raise(r.number, r.label + " | " + r.text(0), before.number);
        }
    }

    /** The section of this prefix, made empty when it has no row yet. */
    Section sectionFor(String prefix) {
        return sections.computeIfAbsent(prefix, Section::new);
    }

    /** The global row of this label, or null. */
    CardRow global(String label) {
        return global.get(label);
    }

    /** The global row of this label; refused when the card has none. */
    CardRow required(String label) {
        CardRow r = global.get(label);
        if (r == null) {
            throw Problem.MISSING_ROW.raise(label);
        }
        return r;
    }

    /** The keyed rows of this label by normalised subject, in card order; empty when there are none. */
    Map<String, CardRow> keyed(String label) {
        Map<String, CardRow> m = keyed.get(label);
        return m == null ? Collections.emptyMap() : m;
    }

    /** Every keyed label with its rows. */
    Map<String, LinkedHashMap<String, CardRow>> keyed() {
        return keyed;
    }

    boolean hasSection(String prefix) {
        return sections.containsKey(prefix);
    }

    /** The rows of this section; an empty section when the card has none. */
    Section section(String prefix) {
        return sections.getOrDefault(prefix, new Section(prefix));
    }

    /** The rows of one excess-property section, sorted by kind as they are read. */
    static final class Section {
        final String prefix;
        /** A_k rows by k; each k may have one row per pair */
        final TreeMap<Integer, List<CardRow>> binary = new TreeMap<>();
        /** ternary C_m rows by m; each m may have one row per triple */
        final TreeMap<Integer, List<CardRow>> ternary = new TreeMap<>();
        final List<CardRow> reference = new ArrayList<>();
        /** one row per coefficient of a pair, so a pair's subject repeats */
        final List<CardRow> covariance = new ArrayList<>();

        Section(String prefix) {
            this.prefix = prefix;
        }

        /** Every row of the section in card order. */
        List<CardRow> rows() {
            List<CardRow> all = new ArrayList<>(reference);
            all.addAll(covariance);
            binary.values().forEach(all::addAll);
            ternary.values().forEach(all::addAll);
            all.sort((a, b) -> Integer.compare(a.number, b.number));
            return all;
        }
    }
}
