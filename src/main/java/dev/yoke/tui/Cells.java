package dev.yoke.tui;

import java.util.Locale;

/**
 * Number formats for grid cells: fixed decimals chosen by magnitude so a column of similar values
 * lines up, "-" for values that do not exist.
 */
final class Cells {

    private Cells() {
    }

    /** About three significant figures, no exponent (grid cells are narrow). */
    static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        double a = Math.abs(v);
        String pattern = a >= 100 ? "%.0f" : a >= 10 ? "%.1f" : a >= 1 ? "%.2f" : "%.3f";
        return String.format(Locale.ROOT, pattern, v);
    }

    /** A fraction as a signed percentage with one decimal, e.g. "+12.5%" (margins). */
    static String signedPercent(double fraction) {
        if (Double.isNaN(fraction)) {
            return "-";
        }
        return String.format(Locale.ROOT, "%+.1f%%", fraction * 100);
    }

    /** A fraction as a percentage with one decimal, no sign (duty, efficiency). */
    static String percent(double fraction) {
        if (Double.isNaN(fraction)) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.1f", fraction * 100);
    }

    /** Fixed decimals. */
    static String fixed(double v, int decimals) {
        if (Double.isNaN(v)) {
            return "-";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static final String[] PREFIXES = {"p", "n", "u", "m", "", "k", "M", "G"};

    /**
     * A value with an engineering prefix (power of 1000) and three significant figures, e.g.
     * "4.70 mH" or "20.0 kHz"; "u" stands for micro so ASCII terminals show it.
     */
    static String engineering(double v, String unit) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return number(v) + (unit.isEmpty() ? "" : " " + unit);
        }
        if (v == 0) {
            return "0 " + unit;
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(v)) / 3) * 3;
        exponent = Math.max(-12, Math.min(9, exponent));
        double scaled = v / Math.pow(10, exponent);
        // Rounding can carry 999.7 to 1000: move to the next prefix.
        if (Math.abs(Double.parseDouble(String.format(Locale.ROOT, "%.3g", scaled))) >= 1000 && exponent < 9) {
            exponent += 3;
            scaled = v / Math.pow(10, exponent);
        }
        String digits = Math.abs(scaled) >= 100 ? String.format(Locale.ROOT, "%.0f", scaled)
                : Math.abs(scaled) >= 10 ? String.format(Locale.ROOT, "%.1f", scaled)
                : String.format(Locale.ROOT, "%.2f", scaled);
        return digits + " " + PREFIXES[exponent / 3 + 4] + unit;
    }
}
