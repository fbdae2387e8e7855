package dev.yoke.tui.edit;

import dev.yoke.units.Dimension;
import dev.yoke.units.UnitException;
import dev.yoke.units.Units;

/**
 * The kinds of quantity the editors' fields hold, read and written by {@link Units}: fields show
 * {@link Units#formatExact} text, so a field left alone gives back the very same value.
 */
public final class Quantities {

    private Quantities() {
    }

    /** A field's reader and writer for quantities of dimension {@code d}. */
    public static QuantityText of(Dimension d) {
        return new QuantityText() {
            @Override
            public double parse(String text) {
                try {
                    return Units.parse(text, d);
                } catch (UnitException e) {
                    throw new IllegalArgumentException(e.getMessage(), e);
                }
            }

            @Override
            public String format(double value) {
                return Units.formatExact(value, d);
            }

            @Override
            public String unit() {
                return d == Dimension.ANGULAR_SPEED ? "rad/s" : d.symbol();
            }
        };
    }

    public static final QuantityText OHMS = of(Dimension.RESISTANCE);
    public static final QuantityText HENRIES = of(Dimension.INDUCTANCE);
    public static final QuantityText VOLTS = of(Dimension.VOLTAGE);
    public static final QuantityText AMPERES = of(Dimension.CURRENT);
    public static final QuantityText SECONDS = of(Dimension.TIME);
    public static final QuantityText HERTZ = of(Dimension.FREQUENCY);
    public static final QuantityText FARADS = of(Dimension.CAPACITANCE);
    public static final QuantityText COULOMBS = of(Dimension.CHARGE);
    public static final QuantityText KILOGRAMS = of(Dimension.MASS);
    /** Absolute temperatures, °C. */
    public static final QuantityText CELSIUS = of(Dimension.TEMPERATURE);
    /** Temperature differences and margins, K. */
    public static final QuantityText KELVIN = of(Dimension.TEMPERATURE_DIFFERENCE);
    public static final QuantityText KELVIN_PER_WATT = of(Dimension.THERMAL_RESISTANCE);
    public static final QuantityText NEWTON_METRES_PER_AMPERE = of(Dimension.TORQUE_CONSTANT);
    public static final QuantityText NEWTON_METRES = of(Dimension.TORQUE);
    public static final QuantityText RADIANS_PER_SECOND = of(Dimension.ANGULAR_SPEED);
    public static final QuantityText KILOGRAM_SQUARE_METRES = of(Dimension.INERTIA);
    /** A plain fraction; {@code %} accepted. */
    public static final QuantityText FRACTION = of(Dimension.DIMENSIONLESS);
    /** A plain number (ratios). */
    public static final QuantityText NUMBER = of(Dimension.DIMENSIONLESS);
    public static final QuantityText PRICE = of(Dimension.PRICE);
}
