package dev.yoke.units;

import java.math.BigDecimal;
import java.util.List;

/**
 * The kinds of quantity a part or scenario file holds, each with the units users may write
 * and the unit Yoke prints.
 *
 * <p>Inside Yoke every value is in SI base units (V, A, Ω, H, F, C, s, Hz, N·m, rad/s, kg·m², kg),
 * except absolute temperatures, which are kept in °C (a plain number in a temperature field is
 * °C; {@code K} is converted). A bare {@code C} is the coulomb; in a temperature field it is
 * refused with a hint to write {@code degC} or {@code °C}, so a file never means two things.
 * Unit symbols follow the SI Brochure (BIPM, 9th ed., 2019); rpm, rpm/V and V/krpm are the
 * trade's customary motor units (common practice).
 */
public enum Dimension {
    RESISTANCE("a resistance", "ohms", "Ω", "Ohm", "1", true, -12, 9, "Ohm", "1", true,
            p("Ω", "1"), p("Ohm", "1"), p("ohm", "1"), p("Ohms", "1"), p("ohms", "1")),
    INDUCTANCE("an inductance", "henries", "H", "H", "1", true, -12, 0, "H", "1", true, p("H", "1")),
    CAPACITANCE("a capacitance", "farads", "F", "F", "1", true, -12, 0, "F", "1", true, p("F", "1")),
    CHARGE("a charge", "coulombs", "C", "C", "1", true, -12, 0, "C", "1", true, p("C", "1")),
    VOLTAGE("a voltage", "volts", "V", "V", "1", true, -3, 3, "V", "1", true, p("V", "1")),
    CURRENT("a current", "amperes", "A", "A", "1", true, -6, 3, "A", "1", true, p("A", "1")),
    POWER("a power", "watts", "W", "W", "1", true, -6, 6, "W", "1", true, p("W", "1")),
    ENERGY("an energy", "joules", "J", "J", "1", true, -3, 6, "J", "1", true, p("J", "1")),
    TIME("a time", "seconds", "s", "s", "1", true, -12, 0, "s", "1", true,
            p("s", "1"), u("min", "60"), u("h", "3600")),
    FREQUENCY("a frequency", "hertz", "Hz", "Hz", "1", true, 0, 9, "Hz", "1", true, p("Hz", "1")),
    TEMPERATURE("a temperature", "degrees Celsius", "°C", "degC", "1", false, 0, 0, "degC", "1", false,
            u("°C", "1"), u("degC", "1"), u("K", "1", "-273.15")),
    TEMPERATURE_DIFFERENCE("a temperature difference", "kelvin", "K", "K", "1", false, 0, 0, "K", "1", false,
            u("K", "1"), u("°C", "1"), u("degC", "1")),
    THERMAL_RESISTANCE("a thermal resistance", "kelvin per watt", "K/W", "K/W", "1", false, 0, 0, "K/W", "1", false,
            u("K/W", "1"), u("°C/W", "1"), u("degC/W", "1")),
    TORQUE("a torque", "newton-metres", "N·m", "N*m", "1", true, -6, 3, "N*m", "1", true,
            p("Nm", "1"), p("N.m", "1")),
    TORQUE_CONSTANT("a torque constant", "newton-metres per ampere", "N·m/A", "N*m/A", "1", true, -6, 0,
            "N*m/A", "1", true,
            p("Nm/A", "1"), p("N.m/A", "1"), p("Vs/rad", "1"), p("V/(rad/s)", "1")),
    BACK_EMF_CONSTANT("a back-EMF constant", "volt-seconds per radian", "V·s/rad", "V*s/rad", "1", true, -6, 0,
            "V*s/rad", "1", true,
            p("Vs/rad", "1"), p("V/(rad/s)", "1"), p("Nm/A", "1"),
            p("V/rpm", 30 / Math.PI), p("V/krpm", 0.03 / Math.PI)),
    SPEED_CONSTANT("a speed constant", "rpm per volt", "rpm/V", "rpm/V", null, false, 0, 0,
            "rad/s/V", "1", false,
            u("rpm/V", Math.PI / 30), u("rad/s/V", "1"), u("(rad/s)/V", "1"), u("rad/(sV)", "1")),
    ANGULAR_SPEED("a speed", "radians per second", "rpm", "rpm", null, false, 0, 0,
            "rad/s", "1", false,
            u("rad/s", "1"), p("rpm", Math.PI / 30), u("r/min", Math.PI / 30), u("rps", 2 * Math.PI),
            u("deg/s", Math.PI / 180), u("°/s", Math.PI / 180)),
    ANGULAR_ACCELERATION("an angular acceleration", "radians per second squared", "rad/s²", "rad/s^2", "1", false,
            0, 0, "rad/s^2", "1", false,
            u("rad/s2", "1"), u("rpm/s", Math.PI / 30)),
    INERTIA("an inertia", "kilogram square metres", "kg·m²", "kg*m^2", "1", false, 0, 0,
            "kg*m^2", "1", false,
            u("kgm2", "1"), u("kgcm2", "1e-4"), u("kgmm2", "1e-6"), u("gcm2", "1e-7"), u("gmm2", "1e-9")),
    MASS("a mass", "kilograms", "g", "g", "1e-3", true, -3, 3, "g", "1e-3", true, p("g", "1e-3")),
    DIMENSIONLESS("a plain ratio", "a ratio", "", "", "1", false, 0, 0, "", "1", false,
            u("%", "0.01")),
    PRICE("a price", "the catalog's currency (a plain number)", "", "", "1", false, 0, 0, "", "1", false);

    private final String noun;
    private final String unitName;
    private final String symbol;
    private final String asciiSymbol;
    final BigDecimal displayFactor;
    final boolean displayPrefixed;
    final int minExponent;
    final int maxExponent;
    final String exactSymbol;
    final BigDecimal exactFactor;
    final boolean exactPrefixed;
    final List<UnitSymbol> accepted;

    Dimension(String noun, String unitName, String symbol, String asciiSymbol, String displayFactor,
            boolean displayPrefixed, int minExponent, int maxExponent, String exactSymbol, String exactFactor,
            boolean exactPrefixed, UnitSymbol... accepted) {
        this.noun = noun;
        this.unitName = unitName;
        this.symbol = symbol;
        this.asciiSymbol = asciiSymbol;
        // A null display factor means the printed unit is not a power of ten of SI: use the first accepted unit.
        this.displayFactor = displayFactor == null ? null : new BigDecimal(displayFactor);
        this.displayPrefixed = displayPrefixed;
        this.minExponent = minExponent;
        this.maxExponent = maxExponent;
        this.exactSymbol = exactSymbol;
        this.exactFactor = new BigDecimal(exactFactor);
        this.exactPrefixed = exactPrefixed;
        this.accepted = List.of(accepted);
    }

    private static UnitSymbol p(String symbol, String factor) {
        return UnitSymbol.of(symbol, factor, true);
    }

    private static UnitSymbol p(String symbol, double factor) {
        return UnitSymbol.of(symbol, factor, true);
    }

    private static UnitSymbol u(String symbol, String factor) {
        return UnitSymbol.of(symbol, factor, false);
    }

    private static UnitSymbol u(String symbol, double factor) {
        return UnitSymbol.of(symbol, factor, false);
    }

    private static UnitSymbol u(String symbol, String factor, String offset) {
        return new UnitSymbol(symbol, new BigDecimal(factor), new BigDecimal(offset), false);
    }

    /** What a value of this kind is, with its article, e.g. "an inductance". */
    public String noun() {
        return noun;
    }

    /** The printed unit's name, e.g. "ohms". */
    public String unitName() {
        return unitName;
    }

    /** The printed unit symbol, e.g. "Ω" (empty for plain numbers). */
    public String symbol() {
        return symbol;
    }

    /** The printed unit symbol in ASCII, e.g. "Ohm". */
    public String asciiSymbol() {
        return asciiSymbol;
    }

    /** The unit {@link Units#formatExact} writes, e.g. "Ohm", "degC", "rad/s". */
    public String exactSymbol() {
        return exactSymbol;
    }

    /** The unit a plain number (no unit written) is read in: the SI unit, °C for temperatures. */
    public String plainUnit() {
        return this == MASS ? "kg" : exactSymbol;
    }

    /** How the expected unit is named in messages, e.g. "ohms (Ω, Ohm)". */
    public String expectation() {
        StringBuilder forms = new StringBuilder();
        for (String s : displayForms()) {
            if (forms.length() > 0) {
                forms.append(", ");
            }
            forms.append(s);
        }
        return forms.length() == 0 ? unitName : unitName + " (" + forms + ")";
    }

    /** The unit spellings a user is most likely to want, for messages and help. */
    public List<String> displayForms() {
        return switch (this) {
            case RESISTANCE -> List.of("Ω", "Ohm");
            case TEMPERATURE -> List.of("degC", "°C", "K");
            case TEMPERATURE_DIFFERENCE -> List.of("K", "degC");
            case TORQUE -> List.of("N*m", "Nm");
            case TORQUE_CONSTANT -> List.of("N*m/A", "V*s/rad");
            case BACK_EMF_CONSTANT -> List.of("V*s/rad", "V/krpm", "V/rpm");
            case SPEED_CONSTANT -> List.of("rpm/V", "rad/s/V");
            case ANGULAR_SPEED -> List.of("rad/s", "rpm", "rps");
            case ANGULAR_ACCELERATION -> List.of("rad/s^2", "rpm/s");
            case INERTIA -> List.of("kg*m^2", "g*cm^2");
            case MASS -> List.of("kg", "g");
            case TIME -> List.of("s", "ms", "min", "h");
            case DIMENSIONLESS -> List.of("e.g. 0.95 or 95 %");
            case PRICE -> List.of();
            default -> List.of(symbol);
        };
    }
}
