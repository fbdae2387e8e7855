package dev.yoke.engine;

/**
 * Signed margins (limit − value)/limit: negative means violated, and every margin reads the same way
 * so that they can be compared and sorted. Always finite.
 */
final class Margins {

    /** Margins are kept within ±this so that sorting and printing never meet an infinity. */
    static final double BOUND = 1e9;

    private Margins() {
    }

    /** (limit − value)/limit; a non-positive limit is violated by any positive value. */
    static double of(double limit, double value) {
        double m;
        if (limit > 0) {
            m = (limit - value) / limit;
        } else {
            m = value <= 0 && limit == 0 ? 0.0 : -1.0;
        }
        if (Double.isNaN(m)) {
            return -1.0;
        }
        return Math.max(-BOUND, Math.min(BOUND, m));
    }

    /** The value that gives a margin against a limit: limit·(1 − margin). */
    static double valueAtMargin(double limit, double margin) {
        return limit * (1 - margin);
    }
}
