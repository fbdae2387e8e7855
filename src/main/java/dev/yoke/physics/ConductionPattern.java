package dev.yoke.physics;

import dev.yoke.model.Modulation;

/**
 * Which of the four switches conducts, and which switches hard, for one modulation, one average
 * output voltage and one current direction (any power-electronics text, e.g. Mohan, Undeland &amp;
 * Robbins, <i>Power Electronics</i>, ch. 7, full-bridge dc-dc converter).
 *
 * <p>Positions are {@link #HIGH_A}, {@link #LOW_A}, {@link #HIGH_B}, {@link #LOW_B}; the motor current
 * I is positive from leg A to leg B. Both switches of a switching leg are driven in complement with
 * a dead time (synchronous rectification). A leg sourcing current (out of its midpoint) hard-switches
 * its high switch and freewheels through its low switch's body diode during the dead times; a leg
 * sinking current does the reverse. Every regenerating quadrant follows from the sign of the leg current.
 *
 * <p>Dead time: the commutating (hard-switching) switch keeps the carrier's edges, since a drive that controls
 * its current ends up commanding the voltage the motor needs and that switch's edges make it (dead-time
 * compensation by the sign of the current, common practice). Its partner's channel is off during both dead
 * times of the leg, while its body diode carries the current, so its on-fraction is the complement less
 * 2·t_dead·f: counting the dead time in the channel as well as in the diode would count it twice.
 *
 * <ul>
 * <li>Bipolar: leg A high-side duty d = (1 + V/V_bus)/2, leg B 1 − d; output ±V_bus at f.</li>
 * <li>Unipolar: leg A (1 + V/V_bus)/2, leg B (1 − V/V_bus)/2, carriers 180° apart; output 0 or ±V_bus at 2f.</li>
 * <li>Sign-magnitude: the leg on the side of the voltage's sign switches at m = |V|/V_bus; the other leg
 * holds its low switch on.</li>
 * </ul>
 *
 * @param onFraction      fraction of the period each position's channel is on (its body diode's dead-time
 *                        share excluded when the pattern is made with a dead time)
 * @param hardSwitching   1 where the position makes the hard turn-on and turn-off of its leg, else 0, by the sign
 *                        of the average current (each edge's own current decides: {@link #hardTurnOns})
 * @param freewheeling    1 where the position's body diode carries the dead times of its leg, else 0, by the sign
 *                        of the average current (each edge's own current decides: {@link #deadTimeDiodeCurrent})
 * @param switchingCount  number of switches driven at the PWM frequency (gate-drive loss)
 * @param rippleSwing     ΔV of the output as a multiple of V_bus
 * @param rippleOnFraction δ of the output waveform
 * @param ripplePeriodFactor output period as a multiple of 1/f (0.5 for unipolar)
 * @param duty            duty as reported: bipolar d, unipolar and sign-magnitude m = |V|/V_bus
 * @param highSideDuty    largest on-fraction of a high switch (what a bootstrap supply limits)
 * @param highShare       per position, the part of the period its channel is on (dead time aside) while the
 *                        ripple waveform of {@link PwmRipple} is in its high interval (δ = {@code rippleOnFraction})
 * @param lowShare        the same in the waveform's low interval
 * @param rippleSign      +1, or −1 where the real output is that waveform upside down (unipolar and
 *                        sign-magnitude with V &lt; 0, whose δ = |V|/V_bus is the share of the −V_bus level)
 * @param deadFraction    one dead time as a fraction of the period, t_dead·f (0 when made without)
 */
public record ConductionPattern(
        double[] onFraction,
        double[] hardSwitching,
        double[] freewheeling,
        int switchingCount,
        double rippleSwing,
        double rippleOnFraction,
        double ripplePeriodFactor,
        double duty,
        double highSideDuty,
        double[] highShare,
        double[] lowShare,
        double rippleSign,
        double deadFraction) {

    public static final int HIGH_A = 0;
    public static final int LOW_A = 1;
    public static final int HIGH_B = 2;
    public static final int LOW_B = 3;
    public static final int POSITIONS = 4;

    /** Names of the positions, in index order. */
    public static final String[] POSITION_NAMES = {"HA", "LA", "HB", "LB"};

    public ConductionPattern {
        onFraction = onFraction.clone();
        hardSwitching = hardSwitching.clone();
        freewheeling = freewheeling.clone();
        highShare = highShare.clone();
        lowShare = lowShare.clone();
    }

    @Override
    public double[] highShare() {
        return highShare.clone();
    }

    @Override
    public double[] lowShare() {
        return lowShare.clone();
    }

    @Override
    public double[] onFraction() {
        return onFraction.clone();
    }

    @Override
    public double[] hardSwitching() {
        return hardSwitching.clone();
    }

    @Override
    public double[] freewheeling() {
        return freewheeling.clone();
    }

    /** On-fraction of one position. */
    public double onFraction(int position) {
        return onFraction[position];
    }

    /** 1 when the position hard-switches, else 0. */
    public double hardSwitching(int position) {
        return hardSwitching[position];
    }

    /** 1 when the position's body diode carries the dead times, else 0. */
    public double freewheeling(int position) {
        return freewheeling[position];
    }

    /**
     * The pattern for a modulation.
     *
     * @param modulation  switching scheme
     * @param voltageRatio V/V_bus, clamped to [−1, 1]
     * @param current     motor current, A (only its sign matters)
     */
    public static ConductionPattern of(Modulation modulation, double voltageRatio, double current) {
        return of(modulation, voltageRatio, current, 0.0);
    }

    /**
     * The pattern for a modulation with dead time: each freewheeling position's channel on-fraction is reduced by
     * 2·t_dead·f (never below 0), the time its body diode conducts instead.
     *
     * @param modulation   switching scheme
     * @param voltageRatio V/V_bus, clamped to [−1, 1]
     * @param current      motor current, A (only its sign matters)
     * @param deadFraction dead time × switching frequency, t_dead·f (one dead time as a fraction of the period)
     */
    public static ConductionPattern of(Modulation modulation, double voltageRatio, double current,
            double deadFraction) {
        ConductionPattern ideal = ideal(modulation, voltageRatio, current);
        if (!(deadFraction > 0)) {
            return ideal;
        }
        double[] on = ideal.onFraction;
        for (int p = 0; p < POSITIONS; p++) {
            if (ideal.freewheeling[p] > 0) {
                on[p] = Math.max(0.0, on[p] - 2 * deadFraction);
            }
        }
        return new ConductionPattern(on, ideal.hardSwitching, ideal.freewheeling, ideal.switchingCount,
                ideal.rippleSwing, ideal.rippleOnFraction, ideal.ripplePeriodFactor, ideal.duty, ideal.highSideDuty,
                ideal.highShare, ideal.lowShare, ideal.rippleSign, deadFraction);
    }

    /** The pattern with no dead time. */
    private static ConductionPattern ideal(Modulation modulation, double voltageRatio, double current) {
        double v = clampRatio(voltageRatio);
        double m = Math.abs(v);
        double[] on = new double[POSITIONS];
        double[] hard = new double[POSITIONS];
        double[] free = new double[POSITIONS];
        double[] high = new double[POSITIONS];
        double[] low = new double[POSITIONS];
        switch (modulation) {
            case BIPOLAR: {
                // +V_bus (HA, LB on) is the waveform's high interval, δ = d; −V_bus (LA, HB on) its low one.
                double d = (1 + v) / 2;
                leg(on, hard, free, HIGH_A, d, true, current);
                leg(on, hard, free, HIGH_B, 1 - d, true, -current);
                high[HIGH_A] = d;
                high[LOW_B] = d;
                low[LOW_A] = 1 - d;
                low[HIGH_B] = 1 - d;
                return new ConductionPattern(on, hard, free, 4, rippleSwing(modulation), d,
                        ripplePeriodFactor(modulation), d, highSideDuty(modulation, v), high, low, 1.0, 0.0);
            }
            case UNIPOLAR: {
                // Per switching period the output makes two ±V_bus pulses (the waveform's high intervals, m of
                // the period in all) and two zero intervals of (1 − m)/2 each, one with both high switches on,
                // one with both low switches on. The leg whose duty exceeds ½ is on through both pulses.
                double dA = (1 + v) / 2;
                double dB = (1 - v) / 2;
                leg(on, hard, free, HIGH_A, dA, true, current);
                leg(on, hard, free, HIGH_B, dB, true, -current);
                double zero = (1 - m) / 2;
                for (int p = 0; p < POSITIONS; p++) {
                    low[p] = zero;
                }
                boolean positive = v >= 0;
                high[positive ? HIGH_A : LOW_A] = m;
                high[positive ? LOW_B : HIGH_B] = m;
                return new ConductionPattern(on, hard, free, 4, rippleSwing(modulation), m,
                        ripplePeriodFactor(modulation), m, highSideDuty(modulation, v), high, low,
                        rippleSign(modulation, v), 0.0);
            }
            case SIGN_MAGNITUDE: {
                // The switching leg's high switch makes the ±V_bus pulses (high intervals, m), its low switch
                // the zero intervals (1 − m); the other leg's low switch is on throughout.
                boolean legASwitches = v >= 0;
                leg(on, hard, free, HIGH_A, legASwitches ? m : 0, legASwitches, current);
                leg(on, hard, free, HIGH_B, legASwitches ? 0 : m, !legASwitches, -current);
                int pulse = legASwitches ? HIGH_A : HIGH_B;
                int hold = legASwitches ? LOW_B : LOW_A;
                high[pulse] = m;
                low[pulse + 1] = 1 - m;
                high[hold] = m;
                low[hold] = 1 - m;
                return new ConductionPattern(on, hard, free, 2, rippleSwing(modulation), m,
                        ripplePeriodFactor(modulation), m, highSideDuty(modulation, v), high, low,
                        rippleSign(modulation, v), 0.0);
            }
            default:
                throw new IllegalArgumentException("unknown modulation " + modulation);
        }
    }

    /**
     * Mean square of one position's channel current times its on-fraction, A² (what R_DS(on) turns into a
     * conduction loss): the exact ripple moments of the intervals the channel is on in, less the dead times
     * of a freewheeling position, which fall at the ripple's two extremes (every switching leg commutates
     * once at the waveform's maximum and once at its minimum). For a triangular ripple this is
     * on-fraction × I_rms²; with an exponential one the channel that is on while the current is higher
     * carries more. {@code meanSquare} is the motor's I_rms² (it may average the waveform over a speed ramp);
     * the interval moments redistribute it from the waveform at this pattern's voltage.
     *
     * @param position   {@link #HIGH_A} … {@link #LOW_B}
     * @param current    average motor current I, A (positive from leg A to leg B)
     * @param meanSquare motor I_rms², A²
     * @param waveform   the ripple at this pattern's voltage ({@link PwmRipple#waveform})
     */
    public double channelSquare(int position, double current, double meanSquare, RippleWaveform waveform) {
        double high = highShare[position];
        double low = lowShare[position];
        double s = rippleSign * current;
        double value = (high + low) * (meanSquare - waveform.variance())
                + high * (2 * s * waveform.highIntervalMean() + waveform.highIntervalSquare())
                + low * (2 * s * waveform.lowIntervalMean() + waveform.lowIntervalSquare());
        if (freewheeling[position] > 0 && deadFraction > 0) {
            double atMax = current + rippleSign * waveform.highDeviation();
            double atMin = current + rippleSign * waveform.lowDeviation();
            value -= deadFraction * (atMax * atMax + atMin * atMin);
        }
        return Math.max(0.0, value);
    }

    /**
     * Mean magnitude of the current through a leg's two dead times, A: one falls at the ripple's maximum, the
     * other at its minimum, so it is their mean, |I| for a triangle. With continuous current the nominal
     * freewheeling diode carries all of it; {@link #deadTimeDiodeCurrent} splits it between the leg's two
     * diodes edge by edge (the two always add up to this).
     */
    public double freewheelingCurrent(double current, RippleWaveform waveform) {
        return (Math.abs(current + rippleSign * waveform.highDeviation())
                + Math.abs(current + rippleSign * waveform.lowDeviation())) / 2;
    }

    /**
     * Current in a position's forward direction (drain to source) at its turn-on, clamped at 0, A: what the V·I
     * overlap of a hard turn-on sees. 0 for a position whose leg does not switch.
     *
     * <p>Each edge of a switching leg turns one switch off and, after the dead time, its partner on. If the leg
     * current at that instant flows forward in the switch turning on, its partner's body diode has been carrying
     * it and the turn-on is hard (the diode is reverse-biased while the channel takes the current at full
     * voltage); if it flows forward in the switch turning off, that turn-off is hard and the partner turns on
     * softly onto its own body diode (clamped inductive switching, Erickson &amp; Maksimović, <i>Fundamentals of
     * Power Electronics</i>, 2nd ed., ch. 4, from memory). So each edge charges exactly one hard event, and
     * {@link #turnOnCurrent} and {@link #turnOffCurrent} are the forward current at the edge, clamped at 0.
     *
     * <p>Which extreme of the ripple an edge sees: the output voltage (leg A minus leg B) steps up when leg A's
     * high switch or leg B's low switch turns on and down when leg A's low or leg B's high switch turns on, and
     * the current reaches its minimum where the output steps up and its maximum where it steps down (the R-L
     * current rises while the output is at its higher level). With continuous current the hard switch therefore
     * turns on at the valley of its current and off at the peak. When the current crosses zero within the
     * period the valley edge reverses: the hard switch's turn-on is soft (0 here) and its partner turns off hard
     * instead, with that reversed current ({@link #hardTurnOns} and {@link #deadTimeDiodeCurrent} follow the same
     * edge-by-edge rule).
     *
     * @param position {@link #HIGH_A} … {@link #LOW_B}
     * @param current  average motor current I, A (positive from leg A to leg B)
     * @param waveform the ripple at this pattern's voltage ({@link PwmRipple#waveform})
     */
    public double turnOnCurrent(int position, double current, RippleWaveform waveform) {
        return edgeCurrent(position, true, current, waveform);
    }

    /** Current in a position's forward direction at its turn-off, clamped at 0, A (see {@link #turnOnCurrent}). */
    public double turnOffCurrent(int position, double current, RippleWaveform waveform) {
        return edgeCurrent(position, false, current, waveform);
    }

    /**
     * Hard turn-ons the position makes per period: 1 or 0, what the Q_rr·V of its partner's body diode and the
     * ½·C_oss·V² dump of {@link #outputCapacitanceDumps} are charged to. Decided at the instant of the turn-on from
     * the signed current, by the rule of {@link #turnOnCurrent}: forward current in the switch turning on means its
     * partner's diode was carrying it, so the channel must discharge its own C_oss and reverse-recover that diode
     * (hard); reverse current means the partner's hard turn-off has already swung the node onto this switch's own
     * body diode, so the load current has discharged C_oss and no diode is recovered by this switch: a zero-voltage
     * turn-on, lossless in the ideal model (Mohan, Undeland &amp; Robbins, <i>Power Electronics</i>, ch. 9, and
     * Erickson &amp; Maksimović, ch. 20, on zero-voltage switching, from memory). With continuous current this is
     * the nominal hard switch ({@link #hardSwitching(int)}); with a ripple that reverses at the valley, neither
     * switch of the leg turns on hard. Exactly zero current at the edge is not a hard turn-on: no body diode was
     * conducting, so none is recovered (its C_oss loss is counted by {@link #outputCapacitanceDumps}). 0 for a leg
     * that does not switch. Like the rest of the ideal-waveform model, this takes any reversed current as swinging
     * the node within the dead time; a real leg needs about 2·C_oss·V/t_dead for that (both output capacitances
     * recharged), and below it keeps part of the ½·C_oss·V² (incomplete zero-voltage switching), which is not
     * modelled.
     *
     * @param position {@link #HIGH_A} … {@link #LOW_B}
     * @param current  average motor current I, A (positive from leg A to leg B)
     * @param waveform the ripple at this pattern's voltage ({@link PwmRipple#waveform})
     */
    public double hardTurnOns(int position, double current, RippleWaveform waveform) {
        int high = position & ~1;
        if (hardSwitching[high] + hardSwitching[high + 1] == 0) {
            return 0.0;
        }
        return forwardAtEdge(position, true, current, waveform) > 0 ? 1.0 : 0.0;
    }

    /**
     * Output-capacitance energy the position's channel dissipates at its turn-on, per period, in units of
     * ½·C_oss·V² (what {@link SwitchLossLaws#outputCapacitance} gives per unit): 1 at a hard turn-on
     * ({@link #hardTurnOns}: its own C_oss discharged in its channel, the textbook count kept by this model), 0 at a
     * zero-voltage turn-on, and 2 at a turn-on at exactly zero current. With no current at the edge nothing swings
     * the node during the dead time, so it still sits at the rail of the switch that just turned off: the switch
     * turning on discharges its own C_oss (½·C_oss·V² lost in its channel) and charges its partner's from the bus
     * through its channel, the bus giving C_oss·V² of which ½·C_oss·V² is stored and ½·C_oss·V² lost (charging a
     * capacitor from a voltage source through a resistance loses as much as it stores). That is C_oss·V² per turn-on
     * for two equal linear C_oss, at each of the leg's two edges (Erickson &amp; Maksimović, <i>Fundamentals of Power
     * Electronics</i>, 2nd ed., ch. 4, capacitive switching loss, from memory). No body diode conducted, so no Q_rr.
     * 0 for a leg that does not switch.
     *
     * @param position {@link #HIGH_A} … {@link #LOW_B}
     * @param current  average motor current I, A (positive from leg A to leg B)
     * @param waveform the ripple at this pattern's voltage ({@link PwmRipple#waveform})
     */
    public double outputCapacitanceDumps(int position, double current, RippleWaveform waveform) {
        int high = position & ~1;
        if (hardSwitching[high] + hardSwitching[high + 1] == 0) {
            return 0.0;
        }
        double forward = forwardAtEdge(position, true, current, waveform);
        return forward > 0 ? 1.0 : forward < 0 ? 0.0 : 2.0;
    }

    /**
     * Mean current the position's body diode carries over its leg's two dead times, A: at each edge of the leg the
     * current flows in reverse through exactly one of the two switches, and that switch's diode carries it for the
     * dead time (the switch turning off, if it was conducting in reverse: the other turns on hard; else the switch
     * turning on, whose turn-on is then soft). Each position takes part in both edges of its leg (once turning on,
     * once turning off), so this is the mean of its reverse current at the two, clamped at 0. With continuous
     * current it is the nominal freewheeling position's {@link #freewheelingCurrent} and 0 for its partner; with a
     * ripple that reverses, the nominal hard switch's diode carries the valley's reversed current and its partner's
     * the peak's, so the leg's total is unchanged and only its split moves. 0 for a leg that does not switch.
     *
     * @param position {@link #HIGH_A} … {@link #LOW_B}
     * @param current  average motor current I, A (positive from leg A to leg B)
     * @param waveform the ripple at this pattern's voltage ({@link PwmRipple#waveform})
     */
    public double deadTimeDiodeCurrent(int position, double current, RippleWaveform waveform) {
        int high = position & ~1;
        if (hardSwitching[high] + hardSwitching[high + 1] == 0) {
            return 0.0;
        }
        double atTurnOn = forwardAtEdge(position, true, current, waveform);
        double atTurnOff = forwardAtEdge(position, false, current, waveform);
        return (Math.max(0.0, -atTurnOn) + Math.max(0.0, -atTurnOff)) / 2;
    }

    private double edgeCurrent(int position, boolean turnOn, double current, RippleWaveform waveform) {
        int high = position & ~1;
        if (hardSwitching[high] + hardSwitching[high + 1] == 0) {
            return 0.0; // a leg that does not switch makes no edges
        }
        return Math.max(0.0, forwardAtEdge(position, turnOn, current, waveform));
    }

    /** Signed current in a position's forward direction at its turn-on or turn-off edge, A. */
    private double forwardAtEdge(int position, boolean turnOn, double current, RippleWaveform waveform) {
        int high = position & ~1;
        boolean forwardWithMotorCurrent = (high == HIGH_A) == (position == high); // HA and LB carry +I forward
        boolean outputStepsUp = forwardWithMotorCurrent == turnOn;
        double first = current + rippleSign * waveform.highDeviation();
        double second = current + rippleSign * waveform.lowDeviation();
        double atEdge = outputStepsUp ? Math.min(first, second) : Math.max(first, second);
        return forwardWithMotorCurrent ? atEdge : -atEdge;
    }

    /** One leg: high-side duty, whether it switches, and the current leaving its midpoint. */
    private static void leg(double[] on, double[] hard, double[] free, int high, double highDuty,
            boolean switching, double legCurrent) {
        int low = high + 1;
        on[high] = highDuty;
        on[low] = 1 - highDuty;
        if (switching) {
            boolean sourcing = legCurrent >= 0;
            hard[sourcing ? high : low] = 1;
            free[sourcing ? low : high] = 1;
        }
    }

    private static double clampRatio(double voltageRatio) {
        return Math.max(-1.0, Math.min(1.0, voltageRatio));
    }

    /** On-fraction δ of the output waveform: bipolar (1 + V/V_bus)/2, else |V|/V_bus. */
    public static double rippleOnFraction(Modulation modulation, double voltageRatio) {
        double v = clampRatio(voltageRatio);
        return modulation == Modulation.BIPOLAR ? (1 + v) / 2 : Math.abs(v);
    }

    /**
     * +1, or −1 where the output is the {@link PwmRipple} waveform of on-fraction {@link #rippleOnFraction}
     * upside down: unipolar and sign-magnitude with V &lt; 0, whose pulses are −V_bus. The real current is then
     * I − deviation, so its extremes are those of {@code waveform.peak(sign × I)}.
     */
    public static double rippleSign(Modulation modulation, double voltageRatio) {
        return modulation != Modulation.BIPOLAR && voltageRatio < 0 ? -1.0 : 1.0;
    }

    /** Duty as reported: bipolar d = (1 + V/V_bus)/2, unipolar and sign-magnitude m = |V|/V_bus. */
    public static double reportedDuty(Modulation modulation, double voltageRatio) {
        return rippleOnFraction(modulation, voltageRatio);
    }

    /** Largest high-switch on-fraction: (1 + m)/2 for bipolar and unipolar, m for sign-magnitude. */
    public static double highSideDuty(Modulation modulation, double voltageRatio) {
        double m = Math.abs(clampRatio(voltageRatio));
        return modulation == Modulation.SIGN_MAGNITUDE ? m : (1 + m) / 2;
    }

    /** Output swing as a multiple of V_bus: 2 bipolar, 1 otherwise. */
    public static double rippleSwing(Modulation modulation) {
        return modulation == Modulation.BIPOLAR ? 2.0 : 1.0;
    }

    /** Output period as a multiple of 1/f: ½ unipolar (carriers 180° apart), 1 otherwise. */
    public static double ripplePeriodFactor(Modulation modulation) {
        return modulation == Modulation.UNIPOLAR ? 0.5 : 1.0;
    }

    /** Largest |V|/V_bus the scheme can make when no high switch may exceed {@code maxDuty}. */
    public static double maxVoltageRatio(Modulation modulation, double maxDuty) {
        return modulation == Modulation.SIGN_MAGNITUDE ? maxDuty : 2 * maxDuty - 1;
    }
}
