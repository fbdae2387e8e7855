package dev.yoke.units;

import java.math.BigDecimal;

/**
 * One way of writing a unit: value in SI = (number × prefix) × factor + offset.
 * Factors and offsets are exact decimals so that reading stays exact where the unit allows.
 *
 * @param symbol     as matched after {@link Units#normalizeUnit} (no spaces, no {@code *} or {@code ^})
 * @param factor     SI value of one unit
 * @param offset     added after scaling (only kelvin to °C uses it)
 * @param prefixable whether SI prefixes may precede the symbol
 */
record UnitSymbol(String symbol, BigDecimal factor, BigDecimal offset, boolean prefixable) {

    static UnitSymbol of(String symbol, String factor, boolean prefixable) {
        return new UnitSymbol(symbol, new BigDecimal(factor), BigDecimal.ZERO, prefixable);
    }

    static UnitSymbol of(String symbol, double factor, boolean prefixable) {
        return new UnitSymbol(symbol, new BigDecimal(factor), BigDecimal.ZERO, prefixable);
    }
}
