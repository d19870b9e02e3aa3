package org.miscela.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Roots where the function is not physical between scan points. Found by the adapter fuzzer (MIX.CONVERT from mol/L
 * on an extreme card): a cell whose ends differ in sign but whose middle is NaN made Brent's method throw Commons
 * Math's NoBracketingException through the add-in. The scan now skips such a cell, as it skips a cell touching a NaN.
 */
class RootsTest {
    /** 0.5 − s, but NaN strictly inside (0.3, 0.7) and so at the cell's midpoint, where Brent's method starts. */
    private static double brokenInTheMiddle(double s) {
        return s > 0.3 && s < 0.7 ? Double.NaN : 0.5 - s;
    }

    @Test
    void aCellWithANonPhysicalMiddleIsSkipped() {
        assertEquals(List.of(), Roots.all(RootsTest::brokenInTheMiddle, null, 0.0, 1.0, 1));
    }

    @Test
    void aFunctionFiniteEverywhereStillHasItsRoot() {
        List<Double> roots = Roots.all(s -> 0.5 - s, null, 0.0, 1.0, 1);
        assertEquals(1, roots.size());
        assertEquals(0.5, roots.get(0), 1e-14);
    }
}
