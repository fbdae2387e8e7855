package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

class WindingThermalNetworkTest {

    private static final double RWH = 2.0;
    private static final double RHA = 6.0;
    private static final double CW = 10.0;
    private static final double CH = 60.0;

    /**
     * First-order RC response (any heat-transfer or circuits text): with a negligible housing capacity the
     * network is one node through R_wh + R_ha, T(t) = P·R·(1 − e^(−t/τ)), τ = R·C_w. The housing's own time
     * constant (1e-6 of the winding's) bounds the deviation: tolerance 1e-5 relative.
     */
    @Test
    void negligibleHousingCapacityGivesTheFirstOrderResponse() {
        WindingThermalNetwork net = new WindingThermalNetwork(RWH, RHA, CW, CW * 1e-7);
        double p = 5;
        double r = RWH + RHA;
        double tau = r * CW;
        for (double t : new double[] {1, 20, 80, 400}) {
            WindingThermalResponse resp = net.respond(new double[] {t}, new double[] {p}, new double[] {0},
                    new double[] {0}, false);
            double expected = p * r * (1 - Math.exp(-t / tau));
            assertEquals(expected, resp.peakRise()[0], expected * 1e-5, "t=" + t);
            double mean = p * r * (1 - tau / t * (1 - Math.exp(-t / tau)));
            assertEquals(mean, resp.meanRise()[0], mean * 1e-5, "mean t=" + t);
        }
    }

    /**
     * With a negligible winding-to-housing resistance both capacities act as one node behind R_ha:
     * τ = R_ha·(C_w + C_h) (first-order RC law). Tolerance 1e-5: R_wh is 1e-7 of R_ha.
     */
    @Test
    void negligibleInnerResistanceMergesTheNodes() {
        WindingThermalNetwork net = new WindingThermalNetwork(RHA * 1e-7, RHA, CW, CH);
        double p = 5;
        double tau = RHA * (CW + CH);
        double t = 300;
        WindingThermalResponse resp = net.respond(new double[] {t}, new double[] {p}, new double[] {0},
                new double[] {0}, false);
        double expected = p * RHA * (1 - Math.exp(-t / tau));
        assertEquals(expected, resp.peakRise()[0], expected * 1e-5);
    }

    /** The two-node network with copper coupling (loss a + b·x_w), integrated as an ODE. */
    private static final class Network implements FirstOrderDifferentialEquations {
        double a;
        double b;
        double ph;

        @Override
        public int getDimension() {
            return 3;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            double pw = a + b * y[0];
            yDot[0] = (pw - (y[0] - y[1]) / RWH) / CW;
            yDot[1] = (ph + (y[0] - y[1]) / RWH - y[1] / RHA) / CH;
            yDot[2] = y[0]; // running integral, for the mean over a piece
        }
    }

    private static final double[] DURATIONS = {3, 12, 0.5, 7, 20};
    private static final double[] LOSS = {40, 8, 90, 0, 15};
    private static final double[] SLOPE = {0.06, 0.03, 0.11, 0, 0.05};
    private static final double[] HOUSING = {1, 2, 0.5, 0, 1.5};

    /** Integrates one piece, sampling the winding rise finely to find its peak; returns the peak. */
    private static double integratePiece(FirstOrderIntegrator ode, Network eq, double duration, double[] y) {
        double peak = y[0];
        int samples = 2000;
        for (int s = 1; s <= samples; s++) {
            double[] out = new double[3];
            ode.integrate(eq, (s - 1) * duration / samples, y, s * duration / samples, out);
            System.arraycopy(out, 0, y, 0, 3);
            peak = Math.max(peak, y[0]);
        }
        return peak;
    }

    /**
     * A single run from ambient against Commons Math's Dormand–Prince 8(5,3) integrator, an independent
     * solver: start, mean and peak winding rise of every piece. Tolerance 1e-6 relative to the largest rise:
     * the integrator runs at 1e-11 tolerances and the peak is sampled at 2000 points per piece.
     */
    @Test
    void singleRunMatchesAnOdeIntegrator() {
        WindingThermalNetwork net = new WindingThermalNetwork(RWH, RHA, CW, CH);
        WindingThermalResponse resp = net.respond(DURATIONS, LOSS, SLOPE, HOUSING, false);
        assertFalse(resp.runaway());
        FirstOrderIntegrator ode = new DormandPrince853Integrator(1e-9, 10, 1e-11, 1e-11);
        Network eq = new Network();
        double[] y = new double[3];
        double scale = resp.maxRise();
        for (int k = 0; k < DURATIONS.length; k++) {
            eq.a = LOSS[k];
            eq.b = SLOPE[k];
            eq.ph = HOUSING[k];
            assertEquals(y[0], resp.startRise()[k], scale * 1e-6, "start of piece " + k);
            y[2] = 0;
            double peak = integratePiece(ode, eq, DURATIONS[k], y);
            assertEquals(peak, resp.peakRise()[k], scale * 1e-6, "peak of piece " + k);
            assertEquals(y[2] / DURATIONS[k], resp.meanRise()[k], scale * 1e-6, "mean of piece " + k);
        }
    }

    /**
     * The periodic state: running the ODE integrator from ambient for many cycles settles onto the
     * closed-form periodic solution (x0 = (I − Φ)⁻¹c). 400 cycles of 42.5 s against a slowest time constant
     * of about 500 s leave e^(−34) of the transient; tolerance 1e-6 relative.
     */
    @Test
    void periodicStateMatchesTheSettledOdeSolution() {
        WindingThermalNetwork net = new WindingThermalNetwork(RWH, RHA, CW, CH);
        WindingThermalResponse resp = net.respond(DURATIONS, LOSS, SLOPE, HOUSING, true);
        assertFalse(resp.runaway());
        FirstOrderIntegrator ode = new DormandPrince853Integrator(1e-9, 50, 1e-12, 1e-12);
        Network eq = new Network();
        double[] y = new double[3];
        for (int cycle = 0; cycle < 400; cycle++) {
            for (int k = 0; k < DURATIONS.length; k++) {
                eq.a = LOSS[k];
                eq.b = SLOPE[k];
                eq.ph = HOUSING[k];
                if (cycle == 399) {
                    assertEquals(y[0], resp.startRise()[k], resp.maxRise() * 1e-6, "start of piece " + k);
                }
                double[] out = new double[3];
                ode.integrate(eq, 0, y, DURATIONS[k], out);
                y = out;
            }
        }
    }

    /**
     * Runaway (law: a linear system whose gain b·(R_wh + R_ha) reaches 1 has no finite steady state):
     * flagged for the periodic and the single run, and all numbers stay finite.
     */
    @Test
    void copperRunawayIsFlaggedAndStaysFinite() {
        WindingThermalNetwork net = new WindingThermalNetwork(RWH, RHA, CW, CH);
        double slope = 1.05 / (RWH + RHA);
        WindingThermalResponse cycle = net.respond(new double[] {1000, 10}, new double[] {50, 0},
                new double[] {slope, 0}, new double[] {0, 0}, true);
        assertTrue(cycle.runaway());
        assertTrue(Double.isFinite(cycle.maxRise()));
        // A single run is followed exactly: a short burst above the limit is no runaway, a long one is.
        WindingThermalResponse burst = net.respond(new double[] {1, 10}, new double[] {50, 0},
                new double[] {slope, 0}, new double[] {0, 0}, false);
        assertFalse(burst.runaway());
        WindingThermalResponse endless = net.respond(new double[] {1e7, 10}, new double[] {50, 0},
                new double[] {slope * 10, 0}, new double[] {0, 0}, false);
        assertTrue(endless.runaway());
        assertTrue(Double.isFinite(endless.maxRise()));
        // Gain 0.95: a steady state exists, 1/(1 − 0.95) = 20 times the cold rise. At 4 W that is
        // 4·8·20 = 640 K, finite and kept; at 50 W it would be 8,000 K, past the 1,000 K beyond which the
        // model means nothing (copper melts at 1085 °C), and is reported as a runaway.
        WindingThermalResponse safe = net.respond(new double[] {1000, 10}, new double[] {4, 0},
                new double[] {0.95 / (RWH + RHA), 0}, new double[] {0, 0}, true);
        assertFalse(safe.runaway());
        WindingThermalResponse meaningless = net.respond(new double[] {1000, 10}, new double[] {50, 0},
                new double[] {0.95 / (RWH + RHA), 0}, new double[] {0, 0}, true);
        assertTrue(meaningless.runaway());
        assertEquals(WindingThermalNetwork.MAX_RISE, meaningless.maxRise(), 1e-9);
    }
}
