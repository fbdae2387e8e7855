package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Invented but physically plausible parts and duty for benchmarks and scale tests. Seeded: the
 * i-th motor or switch of a seed is the same whatever the count asked for, so a 100-part catalog
 * is the head of a 10,000-part one.
 *
 * <p>The relations follow common practice for small permanent-magnet DC motors and low-voltage
 * MOSFETs: k_t from the no-load speed at the nominal voltage, resistance from the stall current,
 * inductance from an electrical time constant of 0.2–3 ms, insulation class B/F/H (IEC 60085);
 * for switches R_DS(on) rising steeply with the voltage rating (roughly V^2.5 for a given die,
 * the silicon limit of power MOSFETs, Baliga, <i>Fundamentals of Power Semiconductor Devices</i>,
 * §6) and falling with die size, while the charges and capacitances grow with die size.
 * The names say "synthetic"; none copies a real part.
 */
public final class SyntheticParts {

    private static final double[] MOTOR_VOLTAGES = {12, 24, 24, 36, 48};
    private static final double[] INSULATION = {130, 155, 155, 180};
    private static final double[] SWITCH_VOLTAGES = {30, 40, 40, 60, 60, 80, 100, 150};

    private SyntheticParts() {
    }

    /** A catalog of {@code motors} motors and {@code switches} switches. */
    public static Catalog catalog(int motors, int switches, long seed) {
        List<Motor> m = new ArrayList<>(motors);
        for (int i = 0; i < motors; i++) {
            m.add(motor(i, seed));
        }
        List<PowerSwitch> s = new ArrayList<>(switches);
        for (int i = 0; i < switches; i++) {
            s.add(powerSwitch(i, seed));
        }
        return new Catalog(m, s);
    }

    /** The {@code index}-th synthetic motor of {@code seed}. */
    public static Motor motor(int index, long seed) {
        SplittableRandom r = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + index * 2L + 1);
        double voltage = MOTOR_VOLTAGES[r.nextInt(MOTOR_VOLTAGES.length)];
        double power = 20 * Math.pow(25, r.nextDouble());                // 20–500 W output
        double noLoadSpeed = (2000 + r.nextDouble() * 6000) * Math.PI / 30; // rad/s
        double kt = voltage * 0.95 / noLoadSpeed;                         // N·m/A = V·s/rad
        double continuous = power / (voltage * 0.75);
        double stall = continuous * (6 + r.nextDouble() * 20);
        double resistance = voltage / stall;
        double tauElectrical = 0.2e-3 + r.nextDouble() * 2.8e-3;
        double size = Math.cbrt(power / 100);                             // 0.58–1.7
        double mass = 0.25 * Math.pow(power / 20, 0.8);
        double rthWinding = (1.0 + r.nextDouble() * 3) / size;
        double rthHousing = (3.0 + r.nextDouble() * 6) / size;
        // Heat capacity from the mass: 450–800 J/(kg·K) for a steel, copper and aluminium mix
        // (common practice), a fifth to a third of it in the winding; τ = C·R_th.
        double capacity = mass * (450 + r.nextDouble() * 350);
        double windingShare = 0.2 + r.nextDouble() * 0.13;
        return new Motor(String.format("SM-%05d", index), "synthetic motor " + (int) power + " W " + (int) voltage + " V",
                voltage, resistance, 20, tauElectrical * resistance, kt,
                continuous * (0.03 + r.nextDouble() * 0.07), continuous, continuous * (3 + r.nextDouble() * 3),
                noLoadSpeed * (1.2 + r.nextDouble() * 0.3), 2e-6 * Math.pow(power / 20, 1.3),
                rthWinding, rthHousing,
                capacity * windingShare * rthWinding, capacity * (1 - windingShare) * rthHousing,
                INSULATION[r.nextInt(INSULATION.length)], r.nextInt(3) == 0 ? 0 : 0.3 + r.nextDouble() * 0.7,
                mass, Math.round(10 + power * (0.2 + r.nextDouble() * 0.4)));
    }

    /** The {@code index}-th synthetic switch of {@code seed}. */
    public static PowerSwitch powerSwitch(int index, long seed) {
        SplittableRandom r = new SplittableRandom(~seed * 0xC2B2AE3D27D4EB4FL + index * 2L + 1);
        double vds = SWITCH_VOLTAGES[r.nextInt(SWITCH_VOLTAGES.length)];
        double die = 1 + r.nextDouble() * 9;                               // relative die area
        double rds = 0.6e-3 * Math.pow(vds / 30, 2.5) * 10 / die * (0.8 + r.nextDouble() * 0.4);
        double qg = 15e-9 * die * (0.8 + r.nextDouble() * 0.5);
        double hotTemp = r.nextBoolean() ? 150 : 175;
        double maxTj = hotTemp;
        double rdsHot = rds * (1.6 + r.nextDouble() * 0.5);
        double rthJunctionCase = 2.0 / die + 0.2;
        // Continuous rating as datasheets state it (common practice): the current whose conduction
        // loss at the hot R_DS(on) lifts the junction from a 25 °C case to T_j,max, here with 10 % to
        // spare, capped by the package; pulsed rating four times that.
        double continuous = Math.min(300, 0.9 * Math.sqrt((maxTj - 25) / (rthJunctionCase * rdsHot)));
        return new PowerSwitch(String.format("SQ-%05d", index), "synthetic " + (int) vds + " V switch",
                die > 5 ? "PKG-L" : "PKG-S", vds, continuous, 4 * continuous,
                rds, rdsHot, hotTemp,
                qg, qg * (0.25 + r.nextDouble() * 0.1), qg * (0.2 + r.nextDouble() * 0.15),
                3 + r.nextDouble() * 2.5, 0.5 + r.nextDouble() * 2.5, 150e-12 * die * Math.sqrt(60 / vds),
                0.7 + r.nextDouble() * 0.3, (10 + r.nextDouble() * 40) * 1e-9 * Math.sqrt(die),
                rthJunctionCase, maxTj, Math.round((0.3 + die * 0.4 * (vds / 60)) * 100) / 100.0);
    }

    /**
     * A 24 V bench with {@code frequencies} PWM frequencies (16 kHz upwards), {@code ratios} gear
     * ratios (geometric from 3 to 40) and a repeating profile of {@code segments} segments
     * (accelerate, cruise, climb, brake, reverse…, cycled).
     */
    public static Scenario scenario(int segments, int frequencies, int ratios, long seed) {
        List<Double> f = new ArrayList<>();
        for (int i = 0; i < frequencies; i++) {
            f.add(16_000.0 * Math.pow(1.5, i));
        }
        List<Double> n = new ArrayList<>();
        for (int i = 0; i < ratios; i++) {
            n.add(ratios == 1 ? 10.0 : Math.round(3 * Math.pow(40.0 / 3, (double) i / (ratios - 1)) * 10) / 10.0);
        }
        Bench bench = new Bench(24, 20, 28.8, f, Modulation.UNIPOLAR, 250e-9, 12, 4.7, 0.95, 30, 25,
                n, 0.85, new Limits(0.8, 125, 10, 0.4));
        SplittableRandom r = new SplittableRandom(seed);
        List<Segment> list = new ArrayList<>();
        double speed = 0;
        for (int i = 0; i < segments; i++) {
            double next;
            String label;
            switch (i % 5) {
                case 0 -> { next = 8 + r.nextDouble() * 6; label = "accelerate"; }
                case 1 -> { next = speed; label = "cruise"; }
                case 2 -> { next = speed * 0.7; label = "climb"; }
                case 3 -> { next = 0; label = "brake"; }
                default -> { next = -(4 + r.nextDouble() * 4); label = "reverse"; }
            }
            if (i == segments - 1) {
                next = 0; // the cycle repeats: end where it started
            }
            double torque = switch (i % 5) {
                case 2 -> 1.5 + r.nextDouble();
                case 3 -> 0.1;
                default -> 0.3 + r.nextDouble() * 0.4;
            };
            list.add(new Segment(label + "-" + (i + 1), 0.5 + r.nextDouble() * 2, speed, next,
                    next < 0 ? -torque : torque));
            speed = next;
        }
        return new Scenario("synthetic", bench, new Profile(0.02, true, list));
    }
}
