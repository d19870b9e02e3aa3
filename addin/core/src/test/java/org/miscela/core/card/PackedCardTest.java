package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The packed card: every test card packs and unpacks to the same content the reader sees (so every result is the
 * same, bit for bit), its text names the card first, and a text changed after packing is refused in words.
 */
class PackedCardTest {
    static Stream<String> cards() {
        return Stream.of("ethanol-water-oiml.tsv", "ethanol-water-covariance.tsv", "sodium-chloride-water-crc.tsv",
                "sulfuric-acid-water-nbs.tsv", "sulfuric-acid-water-whole-range.tsv", "invented-ternary.tsv",
                "ternary-invented.tsv", "ethanol-water-oiml-fahrenheit.tsv", "invented-limited-ternary.tsv");
    }

    /** The unpacked cells are the range's content, cell for cell, with its trailing blanks dropped. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cards")
    void everyCardPacksToTheSameContent(String resource) {
        Object[][] cells = TestCards.cells(resource);
        String packed = PackedCard.pack(cells);
        assertTrue(packed.startsWith(PackedCard.PREFIX + "1 · "), packed.substring(0, 40));
        Object[][] back = PackedCard.unpack(packed);
        assertEquals(trimmed(cells).length, back.length);
        for (int r = 0; r < back.length; r++) {
            Object[] want = trimmed(cells)[r];
            assertEquals(want.length, back[r].length, "row " + (r + 1));
            for (int c = 0; c < want.length; c++) {
                Object w = want[c] == null ? "" : want[c];
                assertEquals(w, back[r][c], "row " + (r + 1) + ", column " + (c + 1));
                if (w instanceof Double) {
                    assertEquals(Double.doubleToRawLongBits((Double) w), Double.doubleToRawLongBits((Double) back[r][c]));
                }
            }
        }
        // a packed card reads as the same card, and the cache keys it by its text
        Card range = CardReader.read(cells);
        Card fromText = new CardCache(4).get(new Object[][] {{packed}});
        assertEquals(range.title(), fromText.title());
        assertEquals(range.source(), fromText.source());
        assertEquals(range.componentNames(), fromText.componentNames());
        assertEquals(packed, PackedCard.pack(back), "canonical: packing the unpacked cells gives the same text");
    }

    private static Object[][] trimmed(Object[][] cells) {
        int rows = cells.length;
        while (rows > 0 && blank(cells[rows - 1])) {
            rows--;
        }
        Object[][] out = new Object[rows][];
        for (int r = 0; r < rows; r++) {
            int n = cells[r] == null ? 0 : cells[r].length;
            while (n > 0 && CardReader.isBlank(cells[r][n - 1])) {
                n--;
            }
            out[r] = n == 0 ? new Object[0] : Arrays.copyOf(cells[r], n);
        }
        return out;
    }

    private static boolean blank(Object[] row) {
        if (row == null) {
            return true;
        }
        for (Object v : row) {
            if (!CardReader.isBlank(v)) {
                return false;
            }
        }
        return true;
    }

    /** The range and its packed text share one parse and one card in the cache, whichever comes first. */
    @Test
    void bothFormsShareOneCard() {
        Object[][] cells = TestCards.cells("ethanol-water-oiml.tsv");
        Object[][] packed = {{PackedCard.pack(cells)}};
        CardCache cache = new CardCache(8);
        Card fromText = cache.get(packed);
        Card fromRange = cache.get(cells);
        assertTrue(fromText == fromRange, "one card for both forms");
        assertEquals(1, cache.parseCount());
        assertTrue(cache.get(packed) == fromRange);
        assertEquals(1, cache.parseCount());
    }

    /** The text starts with the title and source, so a person sees which card a cell holds. */
    @Test
    void theTextNamesTheCardFirst() {
        String packed = PackedCard.pack(TestCards.cells("sulfuric-acid-water-nbs.tsv"));
        assertTrue(packed.startsWith("Miscela packed card 1 · Sulfuric acid + water at 25 °C: heat of mixing · source: "
                + "H^E: Redlich-Kister A0..A2 least-squares fit to the integral… · 22×4 · crc32 "), packed.substring(0, 160));
        assertTrue(packed.matches("(?s).* · 2[0-9]×[0-9] · crc32 [0-9a-f]{8} · cells\\([0-9]+\\): .*"),
                packed.substring(0, 200));
    }

    /** Texts holding the separators, a percent sign and line breaks survive; so does a blank cell inside a row. */
    @Test
    void anyTextSurvives() {
        Object[][] cells = {{"note", "a|b/c%d\te\nf\rg", "", 1.5}, {}, {"x", -0.0, 1e-300, Double.MAX_VALUE}};
        Object[][] back = PackedCard.unpack(PackedCard.pack(cells));
        assertArrayEquals(new Object[] {"note", "a|b/c%d\te\nf\rg", "", 1.5}, back[0]);
        assertEquals(0, back[1].length);
        assertArrayEquals(new Object[] {"x", -0.0, 1e-300, Double.MAX_VALUE}, back[2]);
        assertEquals(Double.doubleToRawLongBits(-0.0), Double.doubleToRawLongBits((Double) back[2][1]));
    }

    /** A packed text changed by hand (a digit, the title, a cut) or of another version is refused, not read. */
    @Test
    void aChangedTextIsRefusedInWords() {
        String packed = PackedCard.pack(TestCards.cells("ethanol-water-oiml.tsv"));
        int digit = packed.lastIndexOf("n0.");
        String edited = packed.substring(0, digit + 3) + (packed.charAt(digit + 3) == '9' ? '8' : '9')
                + packed.substring(digit + 4);
        assertEquals(Problem.PACKED_DAMAGED, refusal(edited).problem());
        assertTrue(refusal(edited).getMessage().contains("its checksum"), refusal(edited).getMessage());
        String retitled = packed.replaceFirst(" · ", " · Another title ");
        assertEquals(Problem.PACKED_DAMAGED, refusal(retitled).problem());
        assertEquals(Problem.PACKED_DAMAGED, refusal(packed.substring(0, packed.length() - 5)).problem());
        assertEquals(Problem.PACKED_VERSION, refusal(packed.replaceFirst("card 1 ·", "card 2 ·")).problem());
        assertFalse(PackedCard.isPacked(new Object[][] {{"Miscela card", 1.0}}));
        assertTrue(PackedCard.isPacked(new Object[][] {{packed}}));
    }

    private static MiscelaException refusal(String text) {
        return assertThrows(MiscelaException.class, () -> PackedCard.unpack(text));
    }
}
