package dev.yoke.tui.edit;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A quantity written as a number, an optional SI prefix and a unit symbol ({@code 4.7 mΩ},
 * {@code 4.7 mOhm}, {@code 16 kHz}); a bare number is taken in the SI unit.
 *
 * <p>Printing shifts the decimal point of the shortest decimal form of the double (engineering
 * notation, exponent a multiple of 3), so reading the printed text gives back the same double.
 * Prefixes and symbols follow the SI brochure (BIPM, 9th ed., 2019), with ASCII spellings
 * ({@code u}, {@code Ohm}) for terminals without Unicode.
 */
final class UnitText implements QuantityText {

    private static final Pattern FORM =
            Pattern.compile("\\s*([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");
    private static final Map<String, Integer> PREFIXES = new LinkedHashMap<>();

    static {
        PREFIXES.put("p", -12);
        PREFIXES.put("n", -9);
        PREFIXES.put("u", -6);
        PREFIXES.put("µ", -6);
        PREFIXES.put("μ", -6);
        PREFIXES.put("m", -3);
        PREFIXES.put("k", 3);
        PREFIXES.put("M", 6);
        PREFIXES.put("G", 9);
    }

    private final String name;
    private final String symbol;
    private final List<String> spellings;
    private final Map<String, Double> others;
    private final boolean prefixes;

    /**
     * @param name      the unit's name in messages, e.g. {@code ohms}
     * @param symbol    shown beside fields and after printed values
     * @param spellings other accepted spellings of the same unit
     * @param others    other units accepted, with the factor to the SI unit (e.g. rpm → rad/s)
     * @param prefixes  whether SI prefixes are accepted and printed
     */
    UnitText(String name, String symbol, List<String> spellings, Map<String, Double> others, boolean prefixes) {
        this.name = name;
        this.symbol = symbol;
        this.spellings = List.copyOf(spellings);
        this.others = Map.copyOf(others);
        this.prefixes = prefixes;
    }

    @Override
    public String unit() {
        return symbol;
    }

    @Override
    public double parse(String text) {
        Matcher m = FORM.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new IllegalArgumentException("expected a number in " + described() + ", got '" + text + "'");
        }
        BigDecimal number = new BigDecimal(m.group(1));
        String unit = m.group(2);
        if (unit.isEmpty() || isSymbol(unit)) {
            return number.doubleValue();
        }
        Double factor = others.get(unit);
        if (factor != null) {
            return number.doubleValue() * factor;
        }
        if (prefixes && unit.length() > 1) {
            Integer power = PREFIXES.get(unit.substring(0, 1));
            if (power != null && isSymbol(unit.substring(1))) {
                return number.scaleByPowerOfTen(power).doubleValue();
            }
        }
        throw new IllegalArgumentException("expected " + described() + ", got '" + text.trim() + "'");
    }

    @Override
    public String format(double value) {
        if (value == 0 || !Double.isFinite(value)) {
            return (value == 0 ? "0" : Double.toString(value)) + suffix();
        }
        BigDecimal exact = new BigDecimal(Double.toString(value));
        if (!prefixes) {
            return plain(exact) + suffix();
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(value)));
        int power = Math.floorDiv(exponent, 3) * 3;
        power = Math.max(-12, Math.min(9, power));
        String prefix = "";
        for (Map.Entry<String, Integer> p : PREFIXES.entrySet()) {
            if (p.getValue() == power && !p.getKey().equals("µ") && !p.getKey().equals("μ")) {
                prefix = p.getKey();
            }
        }
        if (power == -6) {
            prefix = "µ";
        }
        return plain(exact.scaleByPowerOfTen(-power)) + (symbol.isEmpty() ? (power == 0 ? "" : "e" + power)
                : " " + prefix + symbol);
    }

    private String suffix() {
        return symbol.isEmpty() ? "" : " " + symbol;
    }

    private static String plain(BigDecimal d) {
        String s = d.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private boolean isSymbol(String unit) {
        return unit.equals(symbol) || spellings.contains(unit);
    }

    private String described() {
        return symbol.isEmpty() ? name : name + " (" + symbol + ")";
    }
}
