package dev.yoke.units;

/**
 * SI prefixes accepted before a unit symbol (SI Brochure, 9th ed., BIPM 2019, table 7).
 * Case matters: {@code m} is milli, {@code M} is mega. {@code u} stands for micro where µ
 * is hard to type. SPICE's {@code meg} is not accepted: it collides with m (milli) + eg…,
 * and a file should read the same to every engineer.
 */
enum Prefix {
    PICO("p", -12),
    NANO("n", -9),
    MICRO("µ", -6),
    MILLI("m", -3),
    NONE("", 0),
    KILO("k", 3),
    MEGA("M", 6),
    GIGA("G", 9);

    final String symbol;
    final int exponent;

    Prefix(String symbol, int exponent) {
        this.symbol = symbol;
        this.exponent = exponent;
    }

    /** ASCII spelling (micro becomes u). */
    String ascii() {
        return this == MICRO ? "u" : symbol;
    }

    /** The prefix written as {@code text} (µ, μ or u for micro), or null. */
    static Prefix fromSymbol(String text) {
        if (text.equals("u") || text.equals("μ")) {
            return MICRO;
        }
        for (Prefix p : values()) {
            if (p != NONE && p.symbol.equals(text)) {
                return p;
            }
        }
        return null;
    }

    /** The prefix whose exponent is {@code exponent}, or null. */
    static Prefix ofExponent(int exponent) {
        for (Prefix p : values()) {
            if (p.exponent == exponent) {
                return p;
            }
        }
        return null;
    }
}
