package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class UncertainValueNotationTest {

    @Test
    void readsEveryKind() {
        assertEquals(UncertainValue.fixed(14), parse("14", Bounds.NON_NEGATIVE));
        assertEquals(UncertainValue.normal(14, 2).within(Bounds.NON_NEGATIVE, "t"), parse("normal(14, 2)",
                Bounds.NON_NEGATIVE));
        assertEquals(UncertainValue.triangular(0.2, 0.25, 0.28), parse("tri(0.2; 0.25; 0.28)", Bounds.FRACTION));
        assertEquals(UncertainValue.uniform(3, 7), parse(" U(3,7) ", Bounds.UNBOUNDED));
        assertEquals(UncertainValue.truncatedNormal(14, 2, 10, 18), parse("n(14, 2, 10, 18)", Bounds.UNBOUNDED));
        assertEquals(LogNormalValue.ofMedian(100, 0.5), parse("lognormal(100, 0.5)", Bounds.UNBOUNDED));
    }

    @Test
    void formatReadsBackToTheSameValue() {
        List<UncertainValue> values = List.of(UncertainValue.fixed(0.085), UncertainValue.normal(90, 6),
                UncertainValue.truncatedNormal(14, 2, 0, 30), UncertainValue.truncatedNormal(14, 2, 5,
                        Double.POSITIVE_INFINITY), UncertainValue.triangular(4, 6, 9), UncertainValue.uniform(-3, 3),
                LogNormalValue.ofMedian(100, 0.5), new LogNormalValue(100, 0.5, 20, 400));
        for (UncertainValue v : values) {
            String text = UncertainValueNotation.format(v, Bounds.UNBOUNDED);
            assertEquals(v, parse(text, Bounds.UNBOUNDED), text);
        }
    }

    @Test
    void truncationAtTheFieldBoundsIsLeftImplicit() {
        UncertainValue thickness = UncertainValue.normal(14, 2).within(Bounds.NON_NEGATIVE, "thickness");
        assertEquals("normal(14, 2)", UncertainValueNotation.format(thickness, Bounds.NON_NEGATIVE));
    }

    @Test
    void badTextNamesTheFieldAndTheProblem() {
        assertMessage("unit 'Sand A' thickness: 'abc' is not a number", "abc", Bounds.NON_NEGATIVE);
        assertMessage("expected triangular(min, mode, max), found 2 numbers", "triangular(1, 2)", Bounds.UNBOUNDED);
        assertMessage("unknown distribution 'gamma'", "gamma(1, 2)", Bounds.UNBOUNDED);
        assertMessage("missing ')'", "normal(1, 2", Bounds.UNBOUNDED);
        assertMessage("not a finite number", "NaN", Bounds.UNBOUNDED);
        assertMessage("not a finite number", "inf", Bounds.UNBOUNDED);
        // bounds enforced as the model enforces them (thickness >= 0: common practice)
        assertMessage("unit 'Sand A' thickness", "-3", Bounds.NON_NEGATIVE);
        assertMessage("unit 'Sand A' thickness", "uniform(0.5, 1.2)", Bounds.FRACTION);
        assertMessage("enter a number", "  ", Bounds.UNBOUNDED);
    }

    private static UncertainValue parse(String text, Bounds bounds) {
        return UncertainValueNotation.parse(text, bounds, "unit 'Sand A' thickness");
    }

    private static void assertMessage(String expected, String text, Bounds bounds) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> parse(text, bounds));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
