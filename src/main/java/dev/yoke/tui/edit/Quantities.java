package dev.yoke.tui.edit;

import java.util.List;
import java.util.Map;

/** The kinds of quantity the editors' fields hold, SI inside, with the spellings users type. */
public final class Quantities {

    private Quantities() {
    }

    public static final QuantityText OHMS = new UnitText("ohms", "Ω", List.of("Ohm", "ohm", "R"), Map.of(), true);
    public static final QuantityText HENRIES = new UnitText("henries", "H", List.of(), Map.of(), true);
    public static final QuantityText VOLTS = new UnitText("volts", "V", List.of(), Map.of(), true);
    public static final QuantityText AMPERES = new UnitText("amperes", "A", List.of(), Map.of(), true);
    public static final QuantityText SECONDS = new UnitText("seconds", "s", List.of(), Map.of("min", 60.0, "h", 3600.0), true);
    public static final QuantityText HERTZ = new UnitText("hertz", "Hz", List.of(), Map.of(), true);
    public static final QuantityText FARADS = new UnitText("farads", "F", List.of(), Map.of(), true);
    public static final QuantityText COULOMBS = new UnitText("coulombs", "C", List.of(), Map.of(), true);
    public static final QuantityText WATTS = new UnitText("watts", "W", List.of(), Map.of(), true);
    public static final QuantityText KILOGRAMS = new UnitText("kilograms", "kg", List.of(), Map.of("g", 1e-3), false);
    /** °C for absolute temperatures (the model keeps them in °C). */
    public static final QuantityText CELSIUS = new UnitText("degrees Celsius", "°C", List.of("degC", "C"), Map.of(), false);
    /** Kelvin for temperature differences and margins. */
    public static final QuantityText KELVIN = new UnitText("kelvin", "K", List.of("°C", "degC"), Map.of(), false);
    public static final QuantityText KELVIN_PER_WATT =
            new UnitText("kelvin per watt", "K/W", List.of("°C/W", "C/W"), Map.of(), false);
    /** Torque constant; N·m/A equals V·s/rad in SI. */
    public static final QuantityText NEWTON_METRES_PER_AMPERE = new UnitText("newton-metres per ampere", "N·m/A",
            List.of("Nm/A", "N*m/A", "N.m/A", "V·s/rad", "Vs/rad", "V*s/rad"), Map.of(), true);
    public static final QuantityText NEWTON_METRES =
            new UnitText("newton-metres", "N·m", List.of("Nm", "N*m", "N.m"), Map.of(), true);
    /** Angular speed; rpm accepted (1 rpm = 2π/60 rad/s). */
    public static final QuantityText RADIANS_PER_SECOND = new UnitText("radians per second", "rad/s",
            List.of(), Map.of("rpm", 2 * Math.PI / 60, "r/min", 2 * Math.PI / 60), false);
    /** Inertia; g·cm² accepted (1 g·cm² = 1e-7 kg·m²). */
    public static final QuantityText KILOGRAM_SQUARE_METRES = new UnitText("kilogram square metres", "kg·m²",
            List.of("kgm2", "kg*m^2", "kg.m2", "kg·m^2", "kgm^2"),
            Map.of("g·cm²", 1e-7, "gcm2", 1e-7, "g*cm^2", 1e-7, "g.cm2", 1e-7), false);
    /** A plain fraction; {@code %} accepted. */
    public static final QuantityText FRACTION = new UnitText("a fraction", "", List.of(), Map.of("%", 0.01), false);
    /** A plain number (ratios, prices). */
    public static final QuantityText NUMBER = new UnitText("a number", "", List.of(), Map.of(), false);
}
