package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * MIX.CHECK's Gibbs–Helmholtz warning on {@code invented-gibbs-helmholtz.tsv} (invented values, identity tests only:
 * its H^E rows are computed from its G^E/RT rows by H^E = −R·T²·∂(G^E/RT)/∂T, so the relation holds exactly) and on
 * the same card with its H^E made inconsistent.
 */
class CardGibbsHelmholtzTest {
    /** The consistent card: no warning (the central difference agrees to well under 20 J/mol). */
    @Test
    void aConsistentCardIsNotWarned() {
        Object[][] cells = TestCards.cells("invented-gibbs-helmholtz.tsv");
        List<String> w = CardSanity.warnings(cells, CardReader.read(cells));
        assertTrue(w.isEmpty(), w.toString());
    }

    /**
     * The first coefficient of H^E's A0 doubled (2956.40 → 5912.81 J/mol): the stated H^E exceeds the implied one by
     * x1·x2·2956.40 J/mol at every temperature, most at x1 = 0.5: 739.10 J/mol, which the warning reports (4 digits:
     * 739.1), with the implied and stated values there.
     */
    @Test
    void anInconsistentCardIsWarnedWithTheNumbers() {
        Object[][] cells = TestCards.cells("invented-gibbs-helmholtz.tsv");
        for (Object[] row : cells) {
            if ("excess enthalpy A0".equals(row[0])) {
                row[2] = 2 * (Double) row[2];
            }
        }
        Card card = CardReader.read(cells);
        List<String> w = CardSanity.warnings(cells, card);
        assertEquals(1, w.size(), w.toString());
        String text = w.get(0);
        String start = Problem.WARN_GIBBS_HELMHOLTZ.pattern();
        assertTrue(text.startsWith(start.substring(0, start.indexOf('%'))), text);
        assertTrue(text.contains("the worst difference, 739.1 J/mol"), text);
        assertTrue(text.contains("liquid P 0.5, liquid Q 0.5"), text);
        Figures.note(CardGibbsHelmholtzTest.class, "%s", text);
    }

    /** A card with G^E but no H^E (or the reverse) gets no such warning. */
    @Test
    void onlyCardsWithBothSections() {
        for (String name : new String[] {"ethanol-water-vle.tsv", "sulfuric-acid-water-nbs.tsv"}) {
            Object[][] cells = TestCards.cells(name);
            for (String s : CardSanity.warnings(cells, CardReader.read(cells))) {
                assertTrue(!s.contains("Gibbs–Helmholtz"), name + ": " + s);
            }
        }
    }
}
