package dev.yoke.report;

import dev.yoke.units.Dimension;
import dev.yoke.units.Units;
import java.util.Locale;

/** Cell text for tables: engineering prefixes from {@link Units#format}, with or without the unit. */
final class Cells {

    private Cells() {
    }

    /** {@code 4.70 mΩ}. */
    static String full(double si, Dimension d) {
        return Units.format(si, d);
    }

    /**
     * The number and its prefix only ({@code 4.70 m}), for a column whose header already carries
     * the unit ({@code R [Ω]}).
     */
    static String bare(double si, Dimension d) {
        String s = Units.format(si, d);
        String symbol = d.symbol();
        if (!symbol.isEmpty() && s.endsWith(symbol)) {
            s = s.substring(0, s.length() - symbol.length()).stripTrailing();
        }
        return s;
    }

    /** A signed fraction as a percentage, {@code +12%} or {@code -0.4%} (one decimal under 10 %); beyond ±999 % it is clamped. */
    static String percent(double fraction) {
        if (Double.isNaN(fraction)) {
            return "n/a";
        }
        double p = fraction * 100;
        if (p > 999) {
            return ">999%";
        }
        if (p < -999) {
            return "<-999%";
        }
        if (Math.abs(p) < 9.95) {
            String one = String.format(Locale.ROOT, "%.1f", p);
            return (p > 0 && !one.equals("0.0") ? "+" : "") + (one.equals("-0.0") ? "0.0" : one) + "%";
        }
        long rounded = Math.round(p);
        return (rounded > 0 ? "+" : "") + rounded + "%";
    }

    /** A plain ratio, 3 significant digits. */
    static String plain(double v) {
        if (!Double.isFinite(v)) {
            return "n/a";
        }
        return Units.format(v, Dimension.DIMENSIONLESS);
    }

    /** A gear ratio such as {@code 12} or {@code 3.5}. */
    static String ratio(double n) {
        if (n == Math.rint(n) && Math.abs(n) < 1e6) {
            return String.format(Locale.ROOT, "%d", (long) n);
        }
        return plain(n);
    }
}
