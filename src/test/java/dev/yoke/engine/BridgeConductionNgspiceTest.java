package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import dev.yoke.physics.ConductionPattern;
import dev.yoke.physics.Ngspice;
import dev.yoke.physics.SwitchLossLaws;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The engine's per-switch conduction and dead-time diode losses ({@link DriveEvaluator#explain}, which takes
 * them from {@link ConductionPattern} and {@link dev.yoke.physics.SwitchLossLaws}) against the ngspice circuit
 * simulator (Debian package {@code ngspice}, an independent general-purpose tool) running the whole bridge.
 *
 * <p>The netlist: a 24 V bus; four voltage-controlled switches (ngspice {@code SW} model, R_on = 10 mΩ,
 * R_off = 100 MΩ, threshold 0.5 V, no hysteresis), each with an antiparallel diode made of a DC source in series
 * with a steep diode ({@code D} model, IS = 1 nA, N = 0.1, no resistance, capacitance or stored charge) so that
 * the branch drops 0.9 V at 4 A and only N·V_T·ln(I₂/I₁) ≈ 2.6 mV per factor e of current elsewhere; a series
 * R-L load with a back-EMF source. Every switch and diode has its own 0 V sense source, and
 * {@code .meas ... INTEG} of V·I over a whole number of periods after the periodic steady state gives each
 * channel's and each diode's energy separately.
 *
 * <p>Gates are PULSE sources from the carrier comparison of each scheme (centred pulses, one carrier for both
 * legs; bipolar leg B is the complement of leg A) with a 500 ns dead time on every switching leg, placed the
 * way a current-controlled drive ends up with it (dead-time compensation by the sign of the leg current,
 * common practice): the switch that commutates the current keeps the carrier's edges, so the motor sees the
 * voltage it needs, and its partner's on-time is shortened by the dead time at both ends, while its body diode
 * carries the current. The netlist picks that switch from the physics of the leg (which diode can carry the
 * leg current), not from the pattern under test; a wrong freewheeling assignment in the engine would show as
 * diode energy in the wrong position.
 *
 * <p>Twelve cases (three schemes × four quadrants of V and I, 4 A, L/R = 10 periods, nearly constant current)
 * and six with L/R = 1 period, V of either sign for each scheme (exponential ripple of 1.5–4.7 A peak to peak,
 * still continuous), where the channel that is on while the current is higher carries visibly more: the
 * engine gets that from the ripple's interval moments, and the diode's current from the ripple's extremes. The inductor
 * starts at the mean current at t = 0, the middle of an off interval where a triangular ripple crosses its mean,
 * and 20 periods pass before the 4 measured ones: the start-up error left is below 0.03 % of the current.
 * The timestep is at most 1/1000 of a period (Gear integration); at 1/4000 no energy moves by more than 0.002 %.
 *
 * <p>The same runs also read the current at every gate edge ({@link #edgeMeasurements}), against which the
 * current Yoke assigns to each hard turn-on and turn-off, and the V·I overlap it makes of them, are checked,
 * and which diode is on as each gate rises (hard or zero-voltage turn-on, what C_oss is charged to); three more
 * runs with a ripple that reverses check the edge assignment and each diode's dead-time energy there.
 */
class BridgeConductionNgspiceTest {

    private static final double BUS = 24;
    private static final double F = 20e3;
    private static final double PERIOD = 1 / F;
    private static final double DEAD_TIME = 500e-9;
    private static final double ON_RESISTANCE = 10e-3;
    private static final double OFF_RESISTANCE = 1e8;
    private static final double LOAD_RESISTANCE = 2.0;
    private static final double CURRENT = 4.0;
    private static final double FORWARD_VOLTAGE = 0.9;
    private static final double TORQUE_CONSTANT = 0.05;
    /** The series diode of each antiparallel branch: saturation current, A, and emission coefficient. */
    private static final double DIODE_SATURATION = 1e-9;
    private static final double DIODE_EMISSION = 0.1;
    /** Thermal voltage kT/q at ngspice's default 27 °C, V. */
    private static final double THERMAL_VOLTAGE = 8.617333e-5 * 300.15;
    private static final int WARM_UP_PERIODS = 20;
    private static final int MEASURED_PERIODS = 4;
    private static final String[] NAMES = ConductionPattern.POSITION_NAMES;

    /**
     * Channel conduction: 0.5 %. The engine integrates the exact R-L ripple over the intervals each channel is on
     * in, so what is left is the dead time's share (taken at the ripple's extremes, where the current moves by up
     * to 0.1 A during the 500 ns), the start-up residue (below 0.06 % of I²) and the placement of the mean
     * current (below 0.01 %); R_off's leakage, 6 µW, is covered by {@link #IDLE_FLOOR}. Measured: within 0.13 %.
     */
    private static final double CONDUCTION_TOLERANCE = 0.005;
    /**
     * Dead-time diode, L/R = 10 periods: 0.3 %. The diode carries the current at the ripple's two extremes
     * (I ± 0.3 A), and its drop moves by N·V_T·ln(4.3/3.7) ≈ 0.4 mV (0.05 %) between them. Measured: 0.02 %.
     */
    private static final double DIODE_TOLERANCE = 0.003;
    /** L/R below this many periods is the rough-current regime of the second set of cases. */
    private static final double ROUGH_TAU_PERIODS = 3;
    /**
     * Dead-time diode, L/R = 1 period: 1 %. The extremes are 2 and 6 A: the drop moves by
     * N·V_T·ln 3 ≈ 2.8 mV (0.3 %) between them, and the current moves along the steep exponential by up to
     * 0.1 A (2–5 %) within each 500 ns dead time, partly cancelling between the two. Measured: within 0.31 %.
     */
    private static final double ROUGH_DIODE_TOLERANCE = 0.01;
    /** Peak motor current: 0.5 % (see the check). */
    private static final double PEAK_TOLERANCE = 0.005;
    /** Absolute floor, W: an idle channel leaks V_bus²/R_off = 6 µW, a blocking diode branch nW. */
    private static final double IDLE_FLOOR = 2e-5;

    /** One operating point: scheme, V/V_bus, mean motor current (A), L/R in PWM periods. */
    record Case(Modulation modulation, double voltageRatio, double current, double tauPeriods) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%s V/Vbus=%+.2f I=%+.1f A L/R=%.0fT", modulation.fileName(),
                    voltageRatio, current, tauPeriods);
        }
    }

    private static List<Case> cases() {
        List<Case> list = new ArrayList<>();
        for (Modulation m : Modulation.values()) {
            list.add(new Case(m, 0.55, CURRENT, 10)); // motoring forward
            list.add(new Case(m, 0.30, -CURRENT, 10)); // braking forward (regenerating)
            list.add(new Case(m, -0.45, -CURRENT, 10)); // motoring in reverse
            list.add(new Case(m, -0.25, CURRENT, 10)); // braking in reverse
        }
        // L/R = 1 period: one case with V > 0 and one with V < 0 per scheme (the waveform upside down).
        list.add(new Case(Modulation.BIPOLAR, 0.55, CURRENT, 1));
        list.add(new Case(Modulation.BIPOLAR, -0.45, -CURRENT, 1));
        list.add(new Case(Modulation.UNIPOLAR, 0.30, -CURRENT, 1));
        list.add(new Case(Modulation.UNIPOLAR, -0.45, -CURRENT, 1));
        list.add(new Case(Modulation.SIGN_MAGNITUDE, 0.30, -CURRENT, 1));
        list.add(new Case(Modulation.SIGN_MAGNITUDE, -0.25, CURRENT, 1));
        return list;
    }

    // ---- Yoke's side: a scenario whose one segment holds the case's voltage and current ----

    /** An invented motor: 2 Ω, the case's inductance, no friction or brushes, a winding that does not warm. */
    static Motor motor(Case c) {
        double inductance = c.tauPeriods() * PERIOD * LOAD_RESISTANCE;
        return new Motor("m-ref", "reference load", 24, LOAD_RESISTANCE, 20, inductance, TORQUE_CONSTANT, 0, 10, 30,
                1e4, 1e-5, 1e-6, 1e-6, 30, 900, 155, 0, 0.5, 80);
    }

    /** An invented switch matching the netlist: 10 mΩ at any temperature (no junction feedback), 0.9 V diode. */
    static PowerSwitch powerSwitch() {
        return new PowerSwitch("q-ref", "reference switch", "pkg", 60, 50, 200, ON_RESISTANCE, ON_RESISTANCE, 150,
                40e-9, 10e-9, 12e-9, 4.5, 1.0, 500e-12, FORWARD_VOLTAGE, 50e-9, 1.0, 175, 1.0);
    }

    static Scenario scenario(Case c) {
        Bench bench = new Bench(BUS, BUS, BUS, List.of(F), c.modulation(), DEAD_TIME, 12, 4.7, 1.0, 20, 1.0,
                List.of(1.0), 1.0, TestParts.limits());
        double voltage = c.voltageRatio() * BUS;
        double speed = (voltage - c.current() * LOAD_RESISTANCE) / TORQUE_CONSTANT;
        double torque = c.current() * TORQUE_CONSTANT;
        return new Scenario("reference", bench,
                new Profile(0, true, List.of(new Segment("hold", 1.0, speed, speed, torque))));
    }

    private static SegmentResult yoke(Case c) {
        Catalog catalog = new Catalog(List.of(motor(c)), List.of(powerSwitch()));
        return DriveEvaluator.of(scenario(c), catalog).explain(0, 0, 0, 0).segments().get(0);
    }

    // ---- the simulator's side ----

    /** A gate on during [start, start + width) of every period (modulo the period). */
    private static String gate(String name, double start, double width) {
        double rise = PERIOD * 2e-5;
        if (width <= 0) {
            return String.format(Locale.ROOT, "V%s g%s 0 DC 0%n", name, name);
        }
        if (width >= PERIOD) {
            return String.format(Locale.ROOT, "V%s g%s 0 DC 1%n", name, name);
        }
        double s = ((start % PERIOD) + PERIOD) % PERIOD;
        if (s + width <= PERIOD) {
            return String.format(Locale.ROOT, "V%s g%s 0 PULSE(0 1 %.12g %.6g %.6g %.12g %.12g)%n", name, name,
                    s - rise / 2, rise, rise, width - rise, PERIOD);
        }
        // The on interval wraps past the period's end: write its off interval, which does not.
        double offStart = s + width - PERIOD;
        double offWidth = PERIOD - width;
        return String.format(Locale.ROOT, "V%s g%s 0 PULSE(1 0 %.12g %.6g %.6g %.12g %.12g)%n", name, name,
                offStart - rise / 2, rise, rise, offWidth - rise, PERIOD);
    }

    /**
     * One leg's gates: high-side duty centred on {@code centre}. A leg sourcing current (out of its midpoint)
     * commutates with its high switch, so the low diode carries the dead times and the low gate is shortened;
     * a sinking leg the reverse. A leg that does not switch holds its low switch on.
     */
    private static String leg(String high, String low, double duty, double centre, double legCurrent,
            boolean switching) {
        if (!switching) {
            return gate(high, 0, 0) + gate(low, 0, PERIOD);
        }
        double width = duty * PERIOD;
        double start = centre - width / 2;
        if (legCurrent >= 0) {
            return gate(high, start, width) + gate(low, start + width + DEAD_TIME, PERIOD - width - 2 * DEAD_TIME);
        }
        return gate(high, start + DEAD_TIME, width - 2 * DEAD_TIME) + gate(low, start + width, PERIOD - width);
    }

    /** A switch from {@code drain} to {@code source} with its antiparallel diode branch, each with a sense source. */
    private static String position(String name, String drain, String source, double diodeOffset) {
        return String.format(Locale.ROOT, ""
                + "S%1$s %2$s x%1$s g%1$s 0 channel%n"
                + "VS%1$s x%1$s %3$s DC 0%n"
                + "VF%1$s %3$s z%1$s DC %4$.9f%n"
                + "D%1$s z%1$s y%1$s steep%n"
                + "VD%1$s y%1$s %2$s DC 0%n"
                + "BC%1$s c%1$s 0 V=v(%2$s,%3$s)*i(VS%1$s)%n"
                + "BD%1$s d%1$s 0 V=v(%3$s,%2$s)*i(VD%1$s)%n", name, drain, source, diodeOffset);
    }

    static String netlist(Case c) {
        double v = c.voltageRatio();
        double dutyA;
        double dutyB;
        double centreB = PERIOD / 2;
        boolean switchA = true;
        boolean switchB = true;
        switch (c.modulation()) {
            case BIPOLAR:
                dutyA = (1 + v) / 2;
                dutyB = 1 - dutyA;
                centreB = 0; // leg B is the complement of leg A
                break;
            case UNIPOLAR:
                dutyA = (1 + v) / 2;
                dutyB = (1 - v) / 2;
                break;
            default:
                switchA = v >= 0;
                switchB = !switchA;
                dutyA = switchA ? Math.abs(v) : 0;
                dutyB = switchB ? Math.abs(v) : 0;
                break;
        }
        double i = c.current();
        // Placement only (the comparison never uses it): the back-EMF that holds the mean current at i, given
        // the two channel drops in series and the diode drop instead of a channel drop during the dead times.
        double deadTimeDrop = ((switchA ? 1 : 0) + (switchB ? 1 : 0))
                * (FORWARD_VOLTAGE - Math.abs(i) * ON_RESISTANCE) * 2 * DEAD_TIME * F * Math.signum(i);
        double emf = (dutyA - dutyB) * BUS - i * LOAD_RESISTANCE - 2 * i * ON_RESISTANCE - deadTimeDrop;
        double inductance = c.tauPeriods() * PERIOD * LOAD_RESISTANCE;
        double diodeOffset = FORWARD_VOLTAGE
                - DIODE_EMISSION * THERMAL_VOLTAGE * Math.log(Math.abs(i) / DIODE_SATURATION);
        double from = WARM_UP_PERIODS * PERIOD;
        double to = (WARM_UP_PERIODS + MEASURED_PERIODS) * PERIOD;
        double step = PERIOD / 1000;

        StringBuilder b = new StringBuilder("* yoke: H-bridge conduction and dead-time diode energies\n");
        b.append(String.format(Locale.ROOT, "VBUS bus 0 DC %.12g%n", BUS));
        b.append(String.format(Locale.ROOT, ".model channel SW(VT=0.5 VH=0 RON=%.12g ROFF=%.12g)%n", ON_RESISTANCE,
                OFF_RESISTANCE));
        b.append(String.format(Locale.ROOT, ".model steep D(IS=%.6g N=%.6g RS=0 CJO=0 TT=0)%n", DIODE_SATURATION,
                DIODE_EMISSION));
        b.append(position("HA", "bus", "a", diodeOffset));
        b.append(position("LA", "a", "0", diodeOffset));
        b.append(position("HB", "bus", "b", diodeOffset));
        b.append(position("LB", "b", "0", diodeOffset));
        String gates = leg("HA", "LA", dutyA, PERIOD / 2, i, switchA) + leg("HB", "LB", dutyB, centreB, -i, switchB);
        b.append(gates);
        b.append("VM a m DC 0\n");
        b.append(String.format(Locale.ROOT, "RL m n %.12g%n", LOAD_RESISTANCE));
        b.append(String.format(Locale.ROOT, "LL n e %.12g IC=%.12g%n", inductance, i));
        b.append(String.format(Locale.ROOT, "VE e b DC %.12g%n", emf));
        // Gear integration: the trapezoidal rule stalls on some diode turn-ons of this stiff, capacitor-free
        // circuit ("timestep too small"); both give the same energies where both run.
        b.append(".options method=gear\n");
        b.append(String.format(Locale.ROOT, ".tran %.6g %.12g 0 %.6g uic%n", step, to, step));
        String window = String.format(Locale.ROOT, "FROM=%.12g TO=%.12g", from, to);
        b.append(".meas tran iavg AVG i(VM) ").append(window).append('\n');
        b.append(".meas tran irms RMS i(VM) ").append(window).append('\n');
        b.append(".meas tran imax MAX i(VM) ").append(window).append('\n');
        b.append(".meas tran imin MIN i(VM) ").append(window).append('\n');
        for (String p : NAMES) {
            b.append(".meas tran channel").append(p).append(" INTEG v(c").append(p).append(") ").append(window)
                    .append('\n');
            b.append(".meas tran diode").append(p).append(" INTEG v(d").append(p).append(") ").append(window)
                    .append('\n');
        }
        b.append(edgeMeasurements(gates, to - PERIOD));
        b.append(".end\n");
        return b.toString();
    }

    /** A gate source line as {@link #gate} writes it: name, then PULSE(v1 v2 delay rise fall width period). */
    private static final Pattern PULSE = Pattern.compile(
            "^V(\\w+) g\\w+ 0 PULSE\\((\\S+) (\\S+) (\\S+) (\\S+) (\\S+) (\\S+) (\\S+)\\)$", Pattern.MULTILINE);
    /** How long before a gate edge the currents are read, s: well inside the 500 ns dead time, past the 1 ns ramp. */
    private static final double BEFORE_EDGE = 5e-9;

    /**
     * The current at each gate edge of the last measured period, read from the simulated circuit alone: the
     * gate lines give the instants (the middle of each 1 ns ramp, where the switch crosses its 0.5 V threshold),
     * and at each instant the branch currents say which event is hard. Before switch X's gate rises, the current
     * in its partner's body diode ({@code onX}) is what X's turn-on takes over at full voltage; before X's gate
     * falls, X's own forward channel current ({@code offX}) is what it turns off into its partner's diode
     * (clamped inductive switching, Erickson &amp; Maksimović, ch. 4, from memory). A reverse channel current at
     * turn-off, or X's own diode conducting at turn-on ({@code ownX}), makes a soft edge: clamped to 0 in the check.
     */
    static String edgeMeasurements(String gates, double periodStart) {
        StringBuilder b = new StringBuilder();
        Matcher m = PULSE.matcher(gates);
        while (m.find()) {
            String name = m.group(1);
            double first = Double.parseDouble(m.group(2));
            double delay = Double.parseDouble(m.group(4));
            double rise = Double.parseDouble(m.group(5));
            double fall = Double.parseDouble(m.group(6));
            double width = Double.parseDouble(m.group(7));
            double toSecond = delay + rise / 2;
            double backToFirst = delay + rise + width + fall / 2;
            double up = first == 0 ? toSecond : backToFirst;
            double down = first == 0 ? backToFirst : toSecond;
            String partner = partner(name);
            b.append(String.format(Locale.ROOT, ".meas tran on%s FIND i(VD%s) AT=%.12g%n", name, partner,
                    inPeriod(up, periodStart) - BEFORE_EDGE));
            b.append(String.format(Locale.ROOT, ".meas tran off%s FIND i(VS%s) AT=%.12g%n", name, name,
                    inPeriod(down, periodStart) - BEFORE_EDGE));
            b.append(String.format(Locale.ROOT, ".meas tran own%s FIND i(VD%s) AT=%.12g%n", name, name,
                    inPeriod(up, periodStart) - BEFORE_EDGE));
        }
        return b.toString();
    }

    /** The other switch of the same leg. */
    private static String partner(String name) {
        return (name.charAt(0) == 'H' ? "L" : "H") + name.charAt(1);
    }

    /** The instant, modulo the period, within [periodStart, periodStart + period), s. */
    private static double inPeriod(double time, double periodStart) {
        double phase = ((time - periodStart) % PERIOD + PERIOD) % PERIOD;
        return periodStart + phase;
    }

    /**
     * Three cases whose ripple crosses zero (L/R = 1 period, ripple 1.5–5.8 A around a simulated mean of
     * 0.4–0.6 A): at the valley edge the current flows the other way, so the nominal hard switch turns on softly
     * and its partner turns off hard, and the valley's dead time is carried by the hard switch's own diode. Only
     * the edge and dead-time diode checks use them: the netlist's dead-time placement and back-EMF assume a current
     * of one sign, so the simulated mean is not the planned one.
     */
    private static List<Case> crossingCases() {
        return List.of(new Case(Modulation.BIPOLAR, 0.10, 0.3, 1),
                new Case(Modulation.UNIPOLAR, -0.50, -0.1, 1),
                new Case(Modulation.SIGN_MAGNITUDE, 0.30, -0.3, 1));
    }

    /**
     * The simulations of {@link #cases()} then {@link #crossingCases()}, run once for both checks (methods of a
     * class run one at a time).
     */
    private static List<Map<String, Double>> simulations;

    private static synchronized List<Map<String, Double>> simulations() throws Exception {
        if (simulations == null) {
            List<Case> cases = new ArrayList<>(cases());
            cases.addAll(crossingCases());
            ExecutorService pool = Executors.newFixedThreadPool(
                    Math.max(2, Runtime.getRuntime().availableProcessors()));
            try {
                List<Future<Map<String, Double>>> runs = new ArrayList<>();
                for (Case c : cases) {
                    runs.add(pool.submit(() -> Ngspice.measure(netlist(c))));
                }
                List<Map<String, Double>> results = new ArrayList<>();
                for (Future<Map<String, Double>> run : runs) {
                    results.add(run.get());
                }
                simulations = results;
            } finally {
                pool.shutdownNow();
            }
        }
        return simulations;
    }

    /**
     * Edge currents, L/R = 10 periods: 5 mA (0.13 % of the 4 A mean). Yoke's waveform is the R-L response to the
     * ideal output; the netlist adds 2 × 10 mΩ of channel in series (1 % of R, which moves the extremes by about
     * 1 % of the ±0.3 A half-ripple, 3 mA) and 0.9 V instead of a channel drop for the dead times
     * (0.86 V × 2 × 500 ns / 1 mH ≈ 0.9 mA a period). Measured: within 0.9 mA. A swapped assignment would be off
     * by the whole ripple, 0.1–0.6 A.
     */
    private static final double EDGE_TOLERANCE = 5e-3;
    /**
     * L/R = 1 period: 25 mA (0.6 % of the mean). The same 1 % of series resistance now shapes an exponential
     * ripple with half-swings up to 2.4 A (about 24 mA), and the dead-time drop bends it ten times more (9 mA a
     * period, L ten times smaller). Measured: within 6.9 mA. A swap would be off by 1.3–4.7 A.
     */
    private static final double ROUGH_EDGE_TOLERANCE = 25e-3;
    /**
     * Reversing ripple: 50 mA. The netlist keeps the dead time where a one-signed current wants it, so at the
     * valley edge the partner's hard turn-off steps the output a dead time early, and the current runs on for up
     * to 500 ns at up to (24 V + 0.6 V)/0.1 mH away from the ideal waveform Yoke describes: at most 0.12 A, less
     * once Yoke is asked at the simulated mean, which absorbs most of the shift. Measured: within 27 mA. A wrong
     * assignment (the reversed current dropped, or charged to the other switch) would be off by the whole
     * reversed current, 0.39–2.4 A.
     */
    private static final double CROSSING_EDGE_TOLERANCE = 0.05;

    /**
     * The current Yoke assigns to each hard turn-on and turn-off ({@link ConductionPattern#turnOnCurrent} through
     * {@link MotorSidePlan}), and the V·I overlap loss it makes of them, against the currents the simulated bridge
     * commutates at each gate edge ({@link #edgeMeasurements}), in all 18 cases: the hard switch turns on at one
     * extreme of the ripple and off at the other, and which is which depends on the scheme, the leg and the sign
     * of the current; and in three cases whose ripple reverses, the valley edge's hard turn-off of the partner.
     */
    @Test
    void hardEdgesSeeTheCurrentTheSimulatedBridgeCommutates() throws Exception {
        Ngspice.requireInstalled();
        List<Case> cases = new ArrayList<>(cases());
        int crossingFrom = cases.size();
        cases.addAll(crossingCases());
        List<Map<String, Double>> sims = simulations();
        StringBuilder report = new StringBuilder("ngspice against the engine, current at each hard edge (A):\n");
        List<Executable> checks = new ArrayList<>();
        for (int k = 0; k < cases.size(); k++) {
            Map<String, Double> sim = sims.get(k);
            boolean crossing = k >= crossingFrom;
            Case planned = cases.get(k);
            Case c = askedCase(planned, sim, crossing);
            Scenario scenario = scenario(c);
            DriveEvaluator evaluator = (DriveEvaluator) DriveEvaluator.of(scenario, new Catalog(List.of(motor(c)),
                    List.of(powerSwitch())));
            MotorSidePlan plan = (MotorSidePlan) evaluator.prepare(0, 0, 0);
            SegmentResult y = evaluator.explain(plan, 0).segments().get(0);
            SwitchConstants constants = new SwitchConstants(powerSwitch(), scenario.bench());
            double tolerance = crossing ? CROSSING_EDGE_TOLERANCE
                    : c.tauPeriods() < ROUGH_TAU_PERIODS ? ROUGH_EDGE_TOLERANCE : EDGE_TOLERANCE;
            String at = c.toString();
            for (int p = 0; p < 4; p++) {
                String name = NAMES[p];
                double simOn = Math.max(0, sim.getOrDefault("on" + name.toLowerCase(), 0.0));
                double simOff = Math.max(0, sim.getOrDefault("off" + name.toLowerCase(), 0.0));
                double yokeOn = 0;
                double yokeOff = 0;
                for (int piece = 0; piece < plan.n; piece++) {
                    yokeOn += plan.weight[piece] * plan.turnOnCurrent[4 * piece + p];
                    yokeOff += plan.weight[piece] * plan.turnOffCurrent[4 * piece + p];
                }
                double on = yokeOn;
                double off = yokeOff;
                report.append(String.format(Locale.ROOT, "%-44s %s on %.5f (yoke %.5f) off %.5f (yoke %.5f)%n", at,
                        name, simOn, on, simOff, off));
                // Source: ngspice (Debian package) simulation of the bridge, partner diode current at the gate rise.
                checks.add(() -> assertEquals(simOn, on, tolerance, "turn-on current " + name + " " + at));
                // Source: ngspice (Debian package) simulation of the bridge, own channel current at the gate fall.
                checks.add(() -> assertEquals(simOff, off, tolerance, "turn-off current " + name + " " + at));
                // The overlap law on the simulated currents with this switch's edge times (13 ns on, 22 ns off,
                // unequal so that a swapped assignment shows): ½·V·f·(I_on·t_on + I_off·t_off) (Erickson &
                // Maksimović, ch. 4, from memory; separate edge currents are common practice). Same tolerance,
                // carried through the law: ½·V·f·(t_on + t_off)·tolerance.
                double expected = SwitchLossLaws.hardSwitching(BUS, simOn, constants.turnOnEdge, simOff,
                        constants.turnOffEdge, F);
                double lossTolerance = 0.5 * BUS * F * (constants.turnOnEdge + constants.turnOffEdge) * tolerance;
                double switching = y.switchLosses().get(p).switching();
                checks.add(() -> assertEquals(expected, switching, lossTolerance, "V·I overlap " + name + " " + at));
            }
        }
        if (Boolean.getBoolean("yoke.showReferences")) {
            System.out.print(report); // -Dyoke.showReferences=true prints the measured agreement
        }
        assertAll(checks);
    }

    @Test
    void conductionAndDeadTimeLossesMatchCircuitSimulationInEveryQuadrant() throws Exception {
        Ngspice.requireInstalled();
        List<Case> cases = cases();
        List<Map<String, Double>> sims = simulations();
        StringBuilder report = new StringBuilder("ngspice against the engine, per position (W):\n");
        List<Executable> checks = new ArrayList<>();
        double window = MEASURED_PERIODS * PERIOD;
        for (int k = 0; k < cases.size(); k++) {
            Case c = cases.get(k);
            Map<String, Double> sim = sims.get(k);
            SegmentResult y = yoke(c);
            String at = c.toString();
            boolean rough = c.tauPeriods() < ROUGH_TAU_PERIODS;
            // Placement, not a check of the engine: the netlist must hold the engine's mean current so that
            // both sides describe one operating point. 0.05 %: the start-up residue and the back-EMF's drop
            // estimate stay below 0.01 %.
            checks.add(() -> assertEquals(c.current(), sim.get("iavg"), 5e-4 * CURRENT, "mean current " + at));
            double peak = Math.max(Math.abs(sim.get("imax")), Math.abs(sim.get("imin")));
            report.append(String.format(Locale.ROOT, "%-44s peak %.5f A (yoke %.5f)%n", at, peak,
                    y.currentPeak()));
            // Source: ngspice (Debian package), largest |i| of the load over 4 periods. 0.5 %: the start-up
            // residue and the diode-versus-channel drop during the dead times bend the waveform by < 0.1 %.
            checks.add(() -> assertEquals(peak, y.currentPeak(), PEAK_TOLERANCE * peak, "peak current " + at));
            for (int p = 0; p < 4; p++) {
                SwitchLoss loss = y.switchLosses().get(p);
                String name = NAMES[p];
                double channel = sim.get("channel" + name.toLowerCase()) / window;
                double diode = sim.get("diode" + name.toLowerCase()) / window;
                report.append(String.format(Locale.ROOT, "%-44s %s channel %.6f W (yoke %.6f)"
                        + " diode %.6f W (yoke %.6f)%n", at, name, channel, loss.conduction(), diode,
                        loss.deadTimeDiode()));
                double diodeTolerance = rough ? ROUGH_DIODE_TOLERANCE : DIODE_TOLERANCE;
                // Source: ngspice (Debian package) simulation of the bridge, channel V·I energy over 4 periods.
                checks.add(() -> assertEquals(channel, loss.conduction(),
                        CONDUCTION_TOLERANCE * channel + IDLE_FLOOR, "channel " + name + " " + at));
                // Source: ngspice (Debian package) simulation of the bridge, diode V·I energy over 4 periods.
                checks.add(() -> assertEquals(diode, loss.deadTimeDiode(),
                        diodeTolerance * diode + IDLE_FLOOR, "dead-time diode " + name + " " + at));
            }
        }
        if (Boolean.getBoolean("yoke.showReferences")) {
            System.out.print(report); // -Dyoke.showReferences=true prints the measured agreement
        }
        assertAll(checks);
    }

    /**
     * Reversing ripple, dead-time diodes: 1 % + 1 mW. At the valley edge the netlist's partner turns off hard a
     * dead time before the carrier edge, so the simulated node swings then and the current runs on from the valley
     * through the diode for the 500 ns at up to 0.22 A/µs (24.6 V over 0.1 mH): the mean diode current sits up to
     * 0.06 A below the ideal valley Yoke describes, plus the 50 mA of {@link #CROSSING_EDGE_TOLERANCE} for the
     * valley itself; 0.11 A × 0.9 V × 500 ns × 20 kHz ≈ 1 mW. The diode branch's drop, set for the planned
     * 0.1–0.3 A, is N·V_T·ln(3.2/0.1) ≈ 9 mV (1 %) higher at the largest edge current. Measured: Yoke 0.27–0.75 mW
     * above, the sign the run-on predicts. The diode chosen by the mean current's sign would leave one diode of each
     * leg at 0 where the simulation shows 3.2–21 mW.
     */
    private static final double CROSSING_DIODE_TOLERANCE = 0.01;
    private static final double CROSSING_DIODE_FLOOR = 1e-3;

    /**
     * With a ripple that reverses, each dead time's current goes to the diode of the switch carrying it in reverse
     * at that edge ({@link ConductionPattern#deadTimeDiodeCurrent}): at the valley edge the nominal hard switch's own
     * diode, at the peak edge its partner's. Checked per diode against the simulated diode energies of the three
     * {@link #crossingCases()}, with Yoke asked at the simulated mean current. And the turn-on decision
     * ({@link ConductionPattern#hardTurnOns}) in all 21 cases: Yoke charges ½·C_oss·V² to a switch exactly when the
     * simulated partner diode is carrying the current as its gate rises (a hard turn-on), and nothing when its own
     * diode is (a zero-voltage turn-on); the netlist has no C_oss, so this checks the decision, not the energy.
     */
    @Test
    void deadTimeDiodesAndHardTurnOnsMatchCircuitSimulationWhenTheRippleReverses() throws Exception {
        Ngspice.requireInstalled();
        List<Case> cases = new ArrayList<>(cases());
        int crossingFrom = cases.size();
        cases.addAll(crossingCases());
        List<Map<String, Double>> sims = simulations();
        StringBuilder report = new StringBuilder("ngspice against the engine, dead-time diodes with a reversing ripple"
                + " (W) and the diode on at each gate rise (A):\n");
        List<Executable> checks = new ArrayList<>();
        double window = MEASURED_PERIODS * PERIOD;
        double capacitance = SwitchLossLaws.outputCapacitance(powerSwitch().outputCapacitance(), BUS, F);
        int hardTurnOns = 0;
        int softTurnOns = 0;
        for (int k = 0; k < cases.size(); k++) {
            Map<String, Double> sim = sims.get(k);
            boolean crossing = k >= crossingFrom;
            Case planned = cases.get(k);
            Case c = askedCase(planned, sim, crossing);
            SegmentResult y = yoke(c);
            String at = c.toString();
            for (int p = 0; p < 4; p++) {
                SwitchLoss loss = y.switchLosses().get(p);
                String name = NAMES[p];
                double simPartner = sim.getOrDefault("on" + name.toLowerCase(), 0.0);
                double simOwn = sim.getOrDefault("own" + name.toLowerCase(), 0.0);
                double yokeCapacitance = loss.outputCapacitance();
                if (crossing) {
                    double diode = sim.get("diode" + name.toLowerCase()) / window;
                    double yokeDiode = loss.deadTimeDiode();
                    report.append(String.format(Locale.ROOT, "%-44s %s diode %.6f W (yoke %.6f)%n", at, name, diode,
                            yokeDiode));
                    // Source: ngspice (Debian package) simulation of the bridge, diode V·I energy over 4 periods.
                    checks.add(() -> assertEquals(diode, yokeDiode, CROSSING_DIODE_TOLERANCE * diode
                            + CROSSING_DIODE_FLOOR, "dead-time diode " + name + " " + at));
                }
                report.append(String.format(Locale.ROOT, "%-44s %s at gate rise: partner diode %+.4f A, own diode"
                        + " %+.4f A; yoke C_oss %.6f W%n", at, name, simPartner, simOwn, yokeCapacitance));
                // Source: ngspice (Debian package), which diode carries the current as the gate rises: a hard
                // turn-on takes it from the partner's diode (Erickson & Maksimović, ch. 4), a zero-voltage one
                // finds the switch's own diode on (Mohan, Undeland & Robbins, ch. 9), both from memory. Only edges
                // where one diode clearly carries current (over 50 mA, the valley placement error above) count.
                if (simPartner > CROSSING_EDGE_TOLERANCE || simOwn > CROSSING_EDGE_TOLERANCE) {
                    boolean hard = simPartner > simOwn;
                    if (hard) {
                        hardTurnOns++;
                    } else {
                        softTurnOns++;
                    }
                    double expected = hard ? capacitance : 0.0;
                    checks.add(() -> assertEquals(expected, yokeCapacitance, 1e-9 * capacitance,
                            (hard ? "C_oss at a hard turn-on " : "no C_oss at a zero-voltage turn-on ") + name
                                    + " " + at));
                }
            }
        }
        if (Boolean.getBoolean("yoke.showReferences")) {
            System.out.print(report); // -Dyoke.showReferences=true prints the measured agreement
        }
        // Both kinds of turn-on must be present, or the decision check would prove nothing.
        assertTrue(hardTurnOns >= 30 && softTurnOns >= 30, hardTurnOns + " hard, " + softTurnOns + " soft turn-ons");
        assertAll(checks);
    }

    /**
     * The case Yoke is asked about. Placement, not a check: a reversing current leaves the simulated mean off the
     * planned one (the back-EMF's dead-time estimate assumes one sign), so Yoke is asked at the simulated mean.
     */
    private static Case askedCase(Case planned, Map<String, Double> sim, boolean crossing) {
        return crossing ? new Case(planned.modulation(), planned.voltageRatio(), sim.get("iavg"), planned.tauPeriods())
                : planned;
    }
}
