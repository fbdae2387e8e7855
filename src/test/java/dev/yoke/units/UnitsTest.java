package dev.yoke.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.EnumSource;

class UnitsTest {

    /**
     * Each row names its source (SI Brochure, definitions of rpm and g·cm²). Tolerance: one part in
     * 1e-12, far below any engineering need; exact decimal conversions are checked exactly below.
     */
    @ParameterizedTest(name = "{0} as {1}")
    @CsvFileSource(resources = "/units/accepted.csv", delimiter = '|', ignoreLeadingAndTrailingWhitespace = false)
    void acceptedInputsGiveTheirSiValue(String text, Dimension dimension, double expected, String source)
            throws UnitException {
        double actual = Units.parse(text, dimension);
        assertEquals(expected, actual, Math.abs(expected) * 1e-12, source);
    }

    @ParameterizedTest(name = "{0} as {1}")
    @CsvFileSource(resources = "/units/refused.csv", delimiter = '|', ignoreLeadingAndTrailingWhitespace = false)
    void refusedInputsSayWhy(String text, Dimension dimension, String fragment) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(text, dimension));
        assertTrue(e.getMessage().contains(fragment), () -> "message '" + e.getMessage() + "' lacks '" + fragment + "'");
    }

    /** Decimal prefixes are exact: 4.7 mΩ must be the double nearest to 0.0047, not 4.7 × 0.001. */
    @Test
    void decimalPrefixesAreExact() throws UnitException {
        assertEquals(0.0047, Units.parse("4.7 mOhm", Dimension.RESISTANCE)); // 4.7*0.001 = 0.0047000000000000004
        assertEquals(2.3e-8, Units.parse("23 nC", Dimension.CHARGE));
        assertEquals(154.85, Units.parse("428 K", Dimension.TEMPERATURE)); // exact decimal subtraction
    }

    @Test
    void formatUsesEngineeringPrefixesAndThreeDigits() {
        assertEquals("4.70 mΩ", Units.format(0.0047, Dimension.RESISTANCE));
        assertEquals("4.70 mOhm", Units.formatAscii(0.0047, Dimension.RESISTANCE));
        assertEquals("20.0 kHz", Units.format(20000, Dimension.FREQUENCY));
        assertEquals("470 µH", Units.format(4.7e-4, Dimension.INDUCTANCE));
        assertEquals("470 uH", Units.formatAscii(4.7e-4, Dimension.INDUCTANCE));
        assertEquals("1.00 kHz", Units.format(999.99, Dimension.FREQUENCY)); // rounding crosses the prefix
        assertEquals("3000 rpm", Units.format(Math.PI * 100, Dimension.ANGULAR_SPEED));
        assertEquals("155 °C", Units.format(155, Dimension.TEMPERATURE));
        assertEquals("155 degC", Units.formatAscii(155, Dimension.TEMPERATURE));
        assertEquals("350 g", Units.format(0.35, Dimension.MASS));
        assertEquals("1.20 kg", Units.format(1.2, Dimension.MASS));
        assertEquals("42.0 g·cm²", Units.format(4.2e-6, Dimension.INERTIA));
        assertEquals("-1.50 A", Units.format(-1.5, Dimension.CURRENT));
        assertEquals("12.50", Units.format(12.5, Dimension.PRICE));
        assertEquals("n/a", Units.format(Double.NaN, Dimension.VOLTAGE));
    }

    /** What format prints must read back within its rounding (3 significant digits: 0.5 %). */
    @ParameterizedTest
    @EnumSource(Dimension.class)
    void formattedTextReadsBackWithinItsRounding(Dimension d) throws UnitException {
        if (d == Dimension.PRICE) {
            return; // prices print in cents by design
        }
        for (double v : new double[] {0.0047, 1.234, 56.78, 999.4, 12345.0, 3.3e-9}) {
            double back = Units.parse(Units.formatAscii(v, d), d);
            assertEquals(v, back, Math.abs(v) * 5e-3, () -> d + " " + Units.formatAscii(v, d));
            back = Units.parse(Units.format(v, d), d);
            assertEquals(v, back, Math.abs(v) * 5e-3, () -> d + " " + Units.format(v, d));
        }
    }

    @Test
    void formatExactExamples() {
        assertEquals("4.7 mOhm", Units.formatExact(0.0047, Dimension.RESISTANCE));
        assertEquals("20 kHz", Units.formatExact(20000, Dimension.FREQUENCY));
        assertEquals("155 degC", Units.formatExact(155, Dimension.TEMPERATURE));
        assertEquals("350 mN*m", Units.formatExact(0.35, Dimension.TORQUE));
        assertEquals("350 g", Units.formatExact(0.35, Dimension.MASS));
        assertEquals("0.95", Units.formatExact(0.95, Dimension.DIMENSIONLESS));
    }

    /** Law: formatExact then parse is the identity on every finite double, in every dimension. */
    @Property(tries = 3000)
    void formatExactRoundTripsExactly(@ForAll double value, @ForAll Dimension d) throws UnitException {
        if (!Double.isFinite(value)) {
            return;
        }
        String text = Units.formatExact(value, d);
        double back = Units.parse(text, d);
        assertEquals(Double.doubleToRawLongBits(value), Double.doubleToRawLongBits(back), text);
    }

    /** Same law over magnitudes engineers use, where prefixes come into play. */
    @Property(tries = 3000)
    void formatExactRoundTripsOverEngineeringMagnitudes(@ForAll long bits, @ForAll Dimension d)
            throws UnitException {
        double exponent = Math.floorMod(bits, 30) - 15;
        double value = Double.longBitsToDouble((bits & 0x000fffffffffffffL) | 0x3ff0000000000000L)
                * Math.pow(10, exponent) * (bits < 0 ? -1 : 1);
        String text = Units.formatExact(value, d);
        assertEquals(value, Units.parse(text, d), 0.0, text);
    }
}
