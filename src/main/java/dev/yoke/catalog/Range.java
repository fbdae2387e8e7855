package dev.yoke.catalog;

import dev.yoke.units.Dimension;
import dev.yoke.units.Units;

/**
 * The physically possible values of a field, e.g. a resistance above zero or a duty in (0, 1].
 *
 * @param min          lower bound (−∞ for none)
 * @param minInclusive whether {@code min} itself is allowed
 * @param max          upper bound (+∞ for none)
 * @param maxInclusive whether {@code max} itself is allowed
 */
public record Range(double min, boolean minInclusive, double max, boolean maxInclusive) {

    /** Any finite value. */
    public static final Range ANY = new Range(Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY, false);
    /** Above zero. */
    public static final Range POSITIVE = new Range(0, false, Double.POSITIVE_INFINITY, false);
    /** Zero or above. */
    public static final Range NON_NEGATIVE = new Range(0, true, Double.POSITIVE_INFINITY, false);
    /** A fraction in (0, 1]. */
    public static final Range FRACTION = new Range(0, false, 1, true);

    /** Between {@code min} and {@code max}, both excluded or included as given. */
    public static Range of(double min, boolean minInclusive, double max, boolean maxInclusive) {
        return new Range(min, minInclusive, max, maxInclusive);
    }

    /** Whether {@code value} lies in the range. */
    public boolean contains(double value) {
        boolean aboveMin = minInclusive ? value >= min : value > min;
        boolean belowMax = maxInclusive ? value <= max : value < max;
        return aboveMin && belowMax;
    }

    /** The range in words with the dimension's unit, e.g. "greater than 0 Ohm" or "in (0, 1]". */
    public String describe(Dimension d) {
        boolean hasMin = min != Double.NEGATIVE_INFINITY;
        boolean hasMax = max != Double.POSITIVE_INFINITY;
        if (hasMin && hasMax) {
            return "between " + show(min, d) + (minInclusive ? " (included)" : " (excluded)") + " and "
                    + show(max, d) + (maxInclusive ? " (included)" : " (excluded)");
        }
        if (hasMin) {
            if (min == 0 && !minInclusive) {
                return "greater than zero";
            }
            return (minInclusive ? "at least " : "greater than ") + show(min, d);
        }
        if (hasMax) {
            return (maxInclusive ? "at most " : "less than ") + show(max, d);
        }
        return "any value";
    }

    private static String show(double v, Dimension d) {
        return v == 0 ? "0" : Units.formatExact(v, d);
    }
}
