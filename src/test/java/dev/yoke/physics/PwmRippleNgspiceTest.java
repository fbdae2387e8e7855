package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.model.Modulation;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The ripple and RMS of {@link PwmRipple} (through the {@link ConductionPattern} of each modulation) against
 * the ngspice circuit simulator (Debian package, an independent general-purpose tool): the bridge's leg
 * voltages as PULSE sources across a series R, L and a back-EMF source. Fifteen operating points, five per
 * modulation, with L/R from 0.2 to 5 PWM periods (where the waveform is exponential, not triangular), both
 * current directions. The simulator starts at the average current and runs 12 time constants before the
 * measured period, so the start-up transient has decayed to e^(−12) ≈ 6·10⁻⁶ of the ripple.
 * Tolerance 1 %: the simulator's timestep is at most 1/2000 of a period and its edges last 10⁻⁶ of a
 * period, so it is far more exact than that; 1 % is the accuracy a ripple estimate needs.
 */
class PwmRippleNgspiceTest {

    private static final double BUS = 24;
    private static final double R = 1.0;
    private static final double F = 20e3;

    /** One operating point: modulation, V/V_bus, L/R in periods, average current. */
    record Point(Modulation modulation, double voltageRatio, double tauPeriods, double current) {
    }

    private static List<Point> points() {
        List<Point> list = new ArrayList<>();
        for (Modulation m : Modulation.values()) {
            list.add(new Point(m, 0.55, 0.2, 3.0));
            list.add(new Point(m, 0.30, 1.0, -2.0));
            list.add(new Point(m, -0.45, 2.0, -4.0));
            list.add(new Point(m, 0.80, 5.0, 1.5));
            // Short L/R at a small negative voltage: unipolar and sign-magnitude run the waveform upside down,
            // and at δ = 0.2 its two extremes are far from symmetric.
            list.add(new Point(m, -0.20, 0.5, 3.0));
        }
        return list;
    }

    /** A leg at V_bus for duty·T centred on T/2 (unipolar legs share one triangular carrier); inverted: the complement. */
    private static String pulse(String name, String node, double duty, double period, double rise, boolean inverted) {
        double low = inverted ? BUS : 0;
        double high = inverted ? 0 : BUS;
        if (duty <= 0) {
            return String.format(Locale.ROOT, "%s %s 0 DC %.12g%n", name, node, low);
        }
        if (duty >= 1) {
            return String.format(Locale.ROOT, "%s %s 0 DC %.12g%n", name, node, high);
        }
        double width = duty * period;
        return String.format(Locale.ROOT, "%s %s 0 PULSE(%.12g %.12g %.12g %.12g %.12g %.12g %.12g)%n", name, node,
                low, high, period / 2 - width / 2 - rise / 2, rise, rise, width - rise, period);
    }

    private static String netlist(Point p) {
        double period = 1 / F;
        double rise = period * 1e-6;
        ConductionPattern c = ConductionPattern.of(p.modulation(), p.voltageRatio(), p.current());
        double legA = c.onFraction(ConductionPattern.HIGH_A);
        double legB = c.onFraction(ConductionPattern.HIGH_B);
        double vAverage = (legA - legB) * BUS;
        double emf = vAverage - p.current() * R;
        double l = p.tauPeriods() * period * R;
        int periods = (int) Math.ceil(12 * p.tauPeriods()) + 2;
        double stop = periods * period;
        double step = period / 2000;
        StringBuilder b = new StringBuilder("* yoke: H-bridge output on R-L-EMF\n");
        b.append(pulse("VA", "a", legA, period, rise, false));
        if (p.modulation() == Modulation.BIPOLAR) {
            // Bipolar: leg B is the complement of leg A (diagonal pairs switch together).
            b.append(pulse("VB", "b", legA, period, rise, true));
        } else {
            b.append(pulse("VB", "b", legB, period, rise, false));
        }
        b.append("VS a x DC 0\n");
        b.append(String.format(Locale.ROOT, "R1 x y %.12g%n", R));
        b.append(String.format(Locale.ROOT, "L1 y z %.12g IC=%.12g%n", l, p.current()));
        b.append(String.format(Locale.ROOT, "VE z b DC %.12g%n", emf));
        b.append(".options reltol=1e-6 abstol=1e-12 vntol=1e-9\n");
        b.append(String.format(Locale.ROOT, ".tran %.6g %.12g 0 %.6g uic%n", step, stop, step));
        String window = String.format(Locale.ROOT, "FROM=%.12g TO=%.12g", stop - period, stop);
        b.append(".meas tran iavg AVG i(VS) ").append(window).append('\n');
        b.append(".meas tran ipp PP i(VS) ").append(window).append('\n');
        b.append(".meas tran irms RMS i(VS) ").append(window).append('\n');
        b.append(".meas tran imax MAX i(VS) ").append(window).append('\n');
        b.append(".meas tran imin MIN i(VS) ").append(window).append('\n');
        b.append(".end\n");
        return b.toString();
    }

    @Test
    void rippleAndRmsMatchCircuitSimulationForAllModulations() throws Exception {
        Ngspice.requireInstalled();
        List<Point> points = points();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(2, Runtime.getRuntime().availableProcessors()));
        List<Future<Map<String, Double>>> runs = new ArrayList<>();
        try {
            for (Point p : points) {
                runs.add(pool.submit(() -> Ngspice.measure(netlist(p))));
            }
            List<Executable> checks = new ArrayList<>();
            for (int i = 0; i < points.size(); i++) {
                Point p = points.get(i);
                Map<String, Double> sim = runs.get(i).get();
                ConductionPattern c = ConductionPattern.of(p.modulation(), p.voltageRatio(), p.current());
                RippleWaveform w = PwmRipple.waveform(c.rippleSwing() * BUS, R, p.tauPeriods() / F * R,
                        c.rippleOnFraction(), c.ripplePeriodFactor() / F);
                String at = p.toString();
                double peak = Math.max(Math.abs(sim.get("imax")), Math.abs(sim.get("imin")));
                double signed = c.rippleSign() * p.current(); // the waveform's extremes around ±I
                checks.add(() -> assertEquals(sim.get("iavg"), p.current(), 0.01 * Math.abs(p.current()), "avg " + at));
                checks.add(() -> assertEquals(sim.get("ipp"), w.peakToPeak(), 0.01 * w.peakToPeak(), "pp " + at));
                checks.add(() -> assertEquals(sim.get("irms"), w.rms(p.current()), 0.01 * w.rms(p.current()),
                        "rms " + at));
                checks.add(() -> assertEquals(peak, w.peak(signed), 0.01 * w.peak(signed), "peak " + at));
            }
            assertAll(checks);
        } finally {
            pool.shutdownNow();
        }
    }
}
