package org.miscela.core.problem;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Numbers in messages: plain, ten significant digits; exponent form (as Calc writes it) only for huge or tiny ones. */
class NumbersTest {
    @Test
    void ordinaryNumbersArePlain() {
        assertEquals("20", Numbers.show(20.0));
        assertEquals("-0.1", Numbers.show(-0.1));
        assertEquals("52.39285027", Numbers.show(52.392850271234));
        assertEquals("0.000000001", Numbers.show(1e-9));
        assertEquals("999999999999999", Numbers.show(999999999999999.0));
        assertEquals("0", Numbers.show(0.0));
    }

    /** A temperature of 1E+308 used to be written out in 309 digits. */
    @Test
    void hugeAndTinyNumbersAreWrittenAsCalcWritesThem() {
        assertEquals("1E+308", Numbers.show(1e308));
        assertEquals("-2.5E+20", Numbers.show(-2.5e20));
        assertEquals("1E+15", Numbers.show(1e15));
        assertEquals("1.797693135E+308", Numbers.show(Double.MAX_VALUE));
        assertEquals("1.5E-12", Numbers.show(1.5e-12));
        assertEquals("4.9E-324", Numbers.show(Double.MIN_VALUE));
        assertEquals("Infinity", Numbers.show(Double.POSITIVE_INFINITY));
    }
}
