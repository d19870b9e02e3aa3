package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.CardFormatDocTest;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCard;
import org.miscela.core.model.Component;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * docs/trace.md must document every label the trace produces. Cards covering every kind of row (ternary terms, a
 * pair treated as ideal, Toop's model, enthalpy with and without heat capacities, extrapolation) are traced and each
 * label, with names, indices and units replaced by placeholders, must appear in the document's table.
 */
class TraceDocTest {
    private static final Pattern UNIT = Pattern.compile("\\[[^\\]]*\\]");

    @Test
    void everyLabelIsDocumented() throws IOException {
        Path doc = CardFormatDocTest.document().getParent().resolve("trace.md");
        String text = new String(Files.readAllBytes(doc), StandardCharsets.UTF_8);
        List<Object[][]> traces = new ArrayList<>();
        double[] x = {0.2, 0.3, 0.5};
        Card ternary = TestCard.ternary().blank(24).row("missing pairs", "ideal")
                .row("multicomponent model", "Toop", "beta")
                .row("excess volume ternary C0", "alpha + beta + gamma", 0.3).read();
        traces.add(CardFunctions.trace(ternary, x, 298.15, PropertyKind.VOLUME, Extrapolation.AS_CARD));
        traces.add(CardFunctions.trace(ternary, x, 400, PropertyKind.VOLUME, Extrapolation.ALLOW));
        Card enthalpy = TestCard.ternary().row("enthalpy unit", "J/mol")
                .row("excess enthalpy A0", "alpha + beta", -500).row("excess enthalpy A0", "alpha + gamma", 200)
                .row("excess enthalpy A0", "beta + gamma", 100)
                .row("excess enthalpy ternary C0", "alpha + beta + gamma", 40)
                .row("heat capacity", "alpha", 112).read();
        traces.add(CardFunctions.trace(enthalpy, x, 298.15, PropertyKind.ENTHALPY, Extrapolation.REFUSE));
        List<String> names = new ArrayList<>();
        for (Component c : enthalpy.components()) {
            names.add(c.name());
        }
        names.add("ethanol");
        names.add("water");
        names.add("sodium chloride");
        // the vapour trace by each G^E model: Redlich–Kister, Wilson, NRTL (the Redlich–Kister card's rows replaced)
        double[] binary = {0.3, 0.7};
        traces.add(CardFunctions.trace(org.miscela.core.card.TestCards.card("ethanol-water-vle.tsv"), binary, 50,
                PropertyKind.VAPOUR, Extrapolation.AS_CARD));
        traces.add(CardFunctions.trace(org.miscela.core.card.TestCards.card("ethanol-water-wilson.tsv"), binary, 70,
                PropertyKind.VAPOUR, Extrapolation.AS_CARD));
        traces.add(CardFunctions.trace(org.miscela.core.card.TestCards.card("ethanol-water-vle.tsv"), binary, 50,
                PropertyKind.FLASH, Extrapolation.AS_CARD));
        traces.add(CardFunctions.trace(org.miscela.core.card.TestCards.card("ethanol-water-vle-ice.tsv"),
                new double[] {0.05, 0.95}, -5, PropertyKind.FREEZING, Extrapolation.ALLOW));
        // a brine: the water's activity from the osmotic coefficient (the library's NaCl card)
        traces.add(CardFunctions.trace(org.miscela.core.card.TestCards.card("library:NaCl"),
                new double[] {0.05, 0.95}, -5, PropertyKind.FREEZING, Extrapolation.AS_CARD));
        List<Object[]> nrtl = new ArrayList<>();
        for (Object[] row : org.miscela.core.card.TestCards.cells("ethanol-water-vle.tsv")) {
            if (!String.valueOf(row[0]).startsWith("excess Gibbs energy")
                    && !(String.valueOf(row[0]).equals("vapour pressure") && "ethanol".equals(row[1]))) {
                nrtl.add(row);
            }
        }
        nrtl.add(new Object[] {"NRTL", "ethanol + water", 0.1, 1.2, 0.3});
        traces.add(CardFunctions.trace(org.miscela.core.card.CardReader.read(nrtl.toArray(new Object[0][])),
                new double[] {0, 1}, 60, PropertyKind.VAPOUR, Extrapolation.AS_CARD));
        int labels = 0;
        for (Object[][] t : traces) {
            for (Object[] row : t) {
                String template = template((String) row[0], names);
                assertTrue(text.contains("| `" + template + "` |"),
                        "docs/trace.md lacks the label `" + template + "` (from \"" + row[0] + "\")");
                labels++;
            }
        }
        assertTrue(labels > 60, "the traces were expected to be long; got " + labels + " rows");
    }

    /** The label with names, pairs, triples, coefficient indices and units replaced by their placeholders. */
    static String template(String label, List<String> names) {
        String s = UNIT.matcher(label).replaceAll("[unit]");
        String any = "(" + String.join("|", names) + ")";
        s = s.replaceAll(any + " \\+ " + any + " \\+ " + any, "<triple>");
        s = s.replaceAll(any + " \\+ " + any, "<pair>");
        s = s.replaceAll(": " + any + "( |$)", ": <component>$2");
        Matcher m = Pattern.compile("^([AC])\\d+ at T").matcher(s);
        if (m.find()) {
            s = m.replaceFirst(m.group(1) + "<k> at T");
        }
        return s;
    }
}
