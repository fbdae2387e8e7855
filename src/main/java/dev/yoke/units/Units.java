package dev.yoke.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads quantities as users write them ({@code 4.7 mΩ}, {@code 0.45mH}, {@code 3000 rpm},
 * {@code 155 degC}) into SI values, and prints SI values back with engineering prefixes.
 *
 * <p>Rules, shared by every file and editor:
 * <ul>
 * <li>A plain number is in SI base units (°C for absolute temperatures, K for differences).</li>
 * <li>Prefixes p n µ (or u) m k M G, case-sensitive; no {@code meg}.</li>
 * <li>Spaces, {@code *} and {@code ·} between unit parts are optional: {@code N*m}, {@code N·m},
 *     {@code Nm}; {@code ²} and {@code ^2} are the same.</li>
 * <li>NaN, infinities, values beyond the double range and empty text are refused.</li>
 * <li>Reading is exact up to one final rounding to double (BigDecimal all the way), so
 *     {@link #formatExact} followed by {@link #parse} gives back the very same double.</li>
 * </ul>
 */
public final class Units {

    private static final Pattern QUANTITY =
            Pattern.compile("([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)", Pattern.DOTALL);
    private static final Pattern NOT_FINITE =
            Pattern.compile("[+-]?\\.?(nan|inf|infinity)\\b.*", Pattern.CASE_INSENSITIVE);

    private Units() {
    }

    /**
     * The SI value of {@code text}, a number with an optional unit of dimension {@code expected}.
     *
     * @throws UnitException naming what was expected and quoting {@code text}
     */
    public static double parse(String text, Dimension expected) throws UnitException {
        if (text == null || text.isBlank()) {
            throw new UnitException("expected " + expected.expectation() + ", got nothing");
        }
        String trimmed = text.strip();
        Matcher m = QUANTITY.matcher(trimmed);
        if (!m.matches()) {
            if (NOT_FINITE.matcher(trimmed).matches()) {
                throw new UnitException("'" + trimmed + "' is not a finite number");
            }
            throw new UnitException("expected a number in " + expected.expectation() + ", got '" + trimmed + "'");
        }
        if (m.group(1).length() > 100) {
            throw new UnitException("'" + trimmed.substring(0, 20) + "...' has more than 100 digits");
        }
        BigDecimal number;
        try {
            number = new BigDecimal(m.group(1));
        } catch (NumberFormatException | ArithmeticException e) {
            throw new UnitException("'" + trimmed + "' is out of range");
        }
        String unit = normalizeUnit(m.group(2));
        Match match = match(unit, expected);
        if (match == null) {
            throw wrongUnit(trimmed, unit, expected);
        }
        return toDouble(number, match, trimmed);
    }

    private static double toDouble(BigDecimal number, Match match, String shown) throws UnitException {
        if (number.signum() == 0) {
            double offset = match.unit.offset().doubleValue();
            // "-0" reads back as −0.0 so that formatExact(−0.0) round-trips.
            return offset == 0 && shown.startsWith("-") ? -0.0 : offset;
        }
        // Decimal magnitude of the number: precision − scale − 1 is the exponent of its first digit.
        long magnitude = (long) number.precision() - number.scale() - 1 + match.prefix.exponent;
        if (magnitude > 330) {
            throw new UnitException("'" + shown + "' is too large");
        }
        if (magnitude < -340) {
            throw new UnitException("'" + shown + "' is too small to be told from zero");
        }
        BigDecimal si = number.scaleByPowerOfTen(match.prefix.exponent).multiply(match.unit.factor())
                .add(match.unit.offset());
        double value = si.doubleValue();
        if (Double.isInfinite(value)) {
            throw new UnitException("'" + shown + "' is too large");
        }
        if (value == 0.0 && si.signum() != 0) {
            throw new UnitException("'" + shown + "' is too small to be told from zero");
        }
        return value;
    }

    private static UnitException wrongUnit(String shown, String unit, Dimension expected) {
        if (expected == Dimension.TEMPERATURE && unit.equals("C")) {
            return new UnitException("'" + shown + "': C is the coulomb; write degC or °C for Celsius");
        }
        if (unit.startsWith(",")) {
            return new UnitException("'" + shown + "': write decimals with a point, e.g. 4.7");
        }
        for (Dimension other : Dimension.values()) {
            if (other != expected && !unit.isEmpty() && match(unit, other) != null) {
                return new UnitException("expected " + expected.expectation() + ", got '" + shown + "' ("
                        + other.noun() + ")");
            }
        }
        return new UnitException("unknown unit '" + unit + "' in '" + shown + "'; expected " + expected.expectation());
    }

    private record Match(UnitSymbol unit, Prefix prefix) {
    }

    private static Match match(String unit, Dimension d) {
        if (unit.isEmpty()) {
            return new Match(new UnitSymbol("", BigDecimal.ONE, BigDecimal.ZERO, false), Prefix.NONE);
        }
        for (UnitSymbol s : d.accepted) {
            if (s.symbol().equals(unit)) {
                return new Match(s, Prefix.NONE);
            }
        }
        for (UnitSymbol s : d.accepted) {
            if (s.prefixable() && unit.length() > s.symbol().length() && unit.endsWith(s.symbol())) {
                Prefix p = Prefix.fromSymbol(unit.substring(0, unit.length() - s.symbol().length()));
                if (p != null) {
                    return new Match(s, p);
                }
            }
        }
        return null;
    }

    /**
     * The unit text with spaces, {@code *}, {@code ^} and multiplication dots removed and look-alike
     * characters unified (Ω/Ω, µ/μ, ℃, º), so that {@code kg·m²} and {@code kg*m^2} compare equal.
     */
    static String normalizeUnit(String unit) {
        StringBuilder b = new StringBuilder(unit.length());
        for (int i = 0; i < unit.length(); i++) {
            char c = unit.charAt(i);
            switch (c) {
                case ' ', '\t', '*', '^', '·', '⋅', '×', '\u00a0' -> { }
                case '²' -> b.append('2');
                case '\u2126' -> b.append('Ω');
                case 'μ' -> b.append('µ');
                case 'º' -> b.append('°');
                case '℃' -> b.append("°C");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    /** {@code si} for people: engineering prefix, 3 significant digits, Unicode symbols ({@code 4.70 mΩ}). */
    public static String format(double si, Dimension d) {
        return format(si, d, false);
    }

    /** As {@link #format} with ASCII symbols ({@code 4.70 mOhm}, {@code 155 degC}) for plain terminals and CSV. */
    public static String formatAscii(double si, Dimension d) {
        return format(si, d, true);
    }

    private static String format(double si, Dimension d, boolean ascii) {
        if (!Double.isFinite(si)) {
            return "n/a";
        }
        String symbol = ascii ? d.asciiSymbol() : d.symbol();
        if (d == Dimension.PRICE) {
            return String.format(Locale.ROOT, "%.2f", si);
        }
        double v;
        if (d.displayFactor == null) {
            String shown = normalizeUnit(d.symbol());
            double factor = d.accepted.stream().filter(u -> u.symbol().equals(shown)).findFirst()
                    .orElseThrow().factor().doubleValue();
            v = si / factor;
        } else {
            v = si / d.displayFactor.doubleValue();
        }
        if (d == Dimension.INERTIA && si != 0 && Math.abs(si) < 1e-3) {
            return plain(si / 1e-7) + (ascii ? " g*cm^2" : " g·cm²");
        }
        if (!d.displayPrefixed) {
            return join(plain(v), symbol);
        }
        if (v == 0) {
            return join("0.00", symbol);
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(v)) / 3) * 3;
        exponent = Math.max(d.minExponent, Math.min(d.maxExponent, exponent));
        double mantissa = v / Math.pow(10, exponent);
        String digits = threeDigits(mantissa);
        if (Math.abs(Double.parseDouble(digits)) >= 1000 && exponent + 3 <= d.maxExponent) {
            exponent += 3;
            mantissa = v / Math.pow(10, exponent);
            digits = threeDigits(mantissa);
        }
        Prefix prefix = Prefix.ofExponent(exponent);
        String p = ascii ? prefix.ascii() : prefix.symbol;
        if (d == Dimension.MASS && exponent == 3) {
            p = "k";
        }
        return digits + " " + p + symbol;
    }

    private static String join(String number, String symbol) {
        return symbol.isEmpty() ? number : number + " " + symbol;
    }

    /** Three significant digits without exponent when 0.001 ≤ |v| < 1e6, scientific otherwise. */
    private static String plain(double v) {
        double a = Math.abs(v);
        if (v == 0) {
            return "0";
        }
        if (a >= 1e6 || a < 1e-3) {
            String s = String.format(Locale.ROOT, "%.2e", v);
            return s.replace("e+0", "e").replace("e-0", "e-").replace("e+", "e");
        }
        return threeDigits(v);
    }

    private static String threeDigits(double v) {
        BigDecimal rounded = new BigDecimal(v).round(new MathContext(3));
        double r = Math.abs(rounded.doubleValue());
        if (r >= 100) {
            return String.format(Locale.ROOT, "%.0f", rounded.doubleValue());
        }
        if (r >= 10) {
            return String.format(Locale.ROOT, "%.1f", rounded.doubleValue());
        }
        if (r >= 1) {
            return String.format(Locale.ROOT, "%.2f", rounded.doubleValue());
        }
        return rounded.stripTrailingZeros().toPlainString();
    }

    /**
     * {@code si} written so that {@link #parse} returns exactly {@code si} again: the shortest decimal
     * that identifies the double, moved by an engineering prefix, in ASCII units ({@code 4.7 mOhm},
     * {@code 314.159 rad/s}, {@code 155 degC}). For saving files.
     *
     * @throws IllegalArgumentException for NaN or infinities, which files never hold
     */
    public static String formatExact(double si, Dimension d) {
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException("not a finite value: " + si);
        }
        BigDecimal value = new BigDecimal(Double.toString(si));
        if (si == 0) {
            String zero = (1 / si < 0 ? "-0" : "0");
            return d.exactSymbol.isEmpty() ? zero : zero + " " + d.exactSymbol;
        }
        value = value.divide(d.exactFactor);
        int exponent = 0;
        if (d.exactPrefixed && value.signum() != 0) {
            int magnitude = value.precision() - value.scale() - 1;
            exponent = Math.floorDiv(magnitude, 3) * 3;
            int min = d == Dimension.MASS ? -3 : -12;
            int max = d == Dimension.MASS ? 3 : (d == Dimension.TIME ? 0 : 9);
            exponent = Math.max(min, Math.min(max, exponent));
        }
        BigDecimal mantissa = value.scaleByPowerOfTen(-exponent).stripTrailingZeros();
        String number = mantissa.abs().compareTo(new BigDecimal("1e-6")) >= 0
                && mantissa.abs().compareTo(new BigDecimal("1e15")) < 0
                ? mantissa.toPlainString() : mantissa.toString();
        String prefix = Prefix.ofExponent(exponent).ascii();
        String symbol = d.exactSymbol;
        if (symbol.isEmpty()) {
            return number;
        }
        return number + " " + prefix + symbol;
    }
}
