package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.Profile;
import dev.yoke.physics.ConductionPattern;
import dev.yoke.physics.Copper;
import dev.yoke.physics.DcMotor;
import dev.yoke.physics.PwmRipple;
import dev.yoke.physics.RippleWaveform;
import dev.yoke.physics.WindingThermalNetwork;
import dev.yoke.physics.WindingThermalResponse;
import java.util.List;

/**
 * One motor at one PWM frequency and gear ratio, evaluated over every profile piece with no switch in
 * sight: currents, voltages, duties, ripple, RMS current, winding temperatures, and per piece and switch
 * position the coefficients that turn a switch's constants into its loss with a few multiply-adds.
 * Immutable once built.
 */
final class MotorSidePlan implements PairingEvaluator.MotorSide {

    /** Passes of the copper-loss ↔ winding-temperature coupling (the ripple's weak dependence on R). */
    static final int THERMAL_PASSES = 4;
    /** Passes stop when no piece's mean winding temperature moves more than this, K (far below the model's accuracy). */
    static final double THERMAL_TOLERANCE = 1e-3;
    /** Passes also stop when no piece's copper loss moves by more than this fraction (the temperatures would not move). */
    static final double LOSS_TOLERANCE = 1e-7;
    /** Audible limit of PWM ripple, Hz (common practice: the upper limit of human hearing). */
    static final double AUDIBLE_LIMIT = 20e3;
    /** L/R shorter than this many output periods reads as a rough current (common practice: "a few"). */
    static final double ROUGH_PERIODS = 3.0;

    final int motorIndex;
    final int frequencyIndex;
    final int ratioIndex;
    final Motor motor;
    final double frequency;
    final double ratio;
    final double cycleTime;
    final ProfilePiece[] pieces;
    final int n;

    final double[] weight;
    final double[] motorSpeedStart;
    final double[] motorSpeedEnd;
    final double[] motorTorque;
    final double[] current;
    final double[] absCurrent;
    final double[] meanSquare;
    final double[] peak;
    final double[] ripple;
    final double[] worstVoltage;
    final double[] worstDuty;
    final double[] neededVoltage;
    final double[] resistance;
    final double[] windingMeanTemp;
    final double[] windingPeakTemp;
    final double[] copperLoss;
    final double[] frictionLoss;
    final double[] brushLoss;
    final double[] terminalPower;
    final double[] mechanicalPower;
    final double[] switchingCount;

    /** Per piece k and position p at k·4 + p: on-fraction × the channel's mean-square current (A²). */
    final double[] conduction;
    /**
     * Per piece and position: hard turn-ons per period, weighted by the share of the piece
     * ({@link ConductionPattern#hardTurnOns}: what Q_rr is charged to; 0 for a zero-voltage or zero-current turn-on).
     */
    final double[] hard;
    /**
     * Per piece and position: ½·C_oss·V² dumps per period, weighted by the share of the piece
     * ({@link ConductionPattern#outputCapacitanceDumps}: 1 per hard turn-on, 2 per turn-on at zero current).
     */
    final double[] capacitance;
    /**
     * Per piece and position: the current at the position's hard turn-on and at its hard turn-off, A, each in the
     * switch's forward direction and clamped at 0 ({@link ConductionPattern#turnOnCurrent}), weighted by the
     * share of the piece (continuous current: the ripple's valley and peak).
     */
    final double[] turnOnCurrent;
    final double[] turnOffCurrent;
    /**
     * Per piece and position: the mean current its body diode carries over the leg's two dead times, A
     * ({@link ConductionPattern#deadTimeDiodeCurrent}: at each edge, the diode of the switch carrying reverse current).
     */
    final double[] freeCurrent;
    /**
     * Doubles per fast-path cell: conduction, ½·C_oss·V² dumps, hard turn-ons (Q_rr), turn-on current, turn-off
     * current, diode current, cycle weight × multiplicity. C_oss and Q_rr have separate entries because a turn-on
     * at zero current dumps C_oss twice and recovers no diode.
     */
    static final int CELL = 7;
    /** Fast-path cells: for each piece, for each distinct busy position, {@link #CELL} doubles. */
    final double[] cells;
    /** Offset in {@link #cells} just past each piece's cells. */
    final int[] pieceEnd;
    /** Positions whose coefficients differ, and how many positions each stands for. */
    final int[] distinct;
    final int[] multiplicity;

    final double availableVoltage;
    final double currentRms;
    final double currentPeak;
    final double dutyMax;
    final double rippleMax;
    final double switchRmsCurrent;
    final double terminalPowerAverage;
    final double motorLossAverage;
    final double gateSwitchesAverage;
    final double energyOut;
    final double windingTempMax;
    final boolean windingRunaway;
    final double marginWinding;
    final double marginMotorPeak;
    final double marginSpeed;
    final double marginRipple;
    final double marginDuty;
    final int advisoryBits;

    MotorSidePlan(int motorIndex, int frequencyIndex, int ratioIndex, Motor motor, Bench bench, Profile profile,
            ProfilePiece[] pieces) {
        this.motorIndex = motorIndex;
        this.frequencyIndex = frequencyIndex;
        this.ratioIndex = ratioIndex;
        this.motor = motor;
        this.frequency = bench.pwmFrequencies().get(frequencyIndex);
        this.ratio = bench.gearRatios().get(ratioIndex);
        this.pieces = pieces;
        this.n = pieces.length;
        double total = 0;
        for (ProfilePiece p : pieces) {
            total += p.duration();
        }
        this.cycleTime = total;
        weight = new double[n];
        motorSpeedStart = new double[n];
        motorSpeedEnd = new double[n];
        motorTorque = new double[n];
        current = new double[n];
        absCurrent = new double[n];
        meanSquare = new double[n];
        peak = new double[n];
        ripple = new double[n];
        worstVoltage = new double[n];
        worstDuty = new double[n];
        neededVoltage = new double[n];
        resistance = new double[n];
        windingMeanTemp = new double[n];
        windingPeakTemp = new double[n];
        copperLoss = new double[n];
        frictionLoss = new double[n];
        brushLoss = new double[n];
        terminalPower = new double[n];
        mechanicalPower = new double[n];
        switchingCount = new double[n];
        conduction = new double[4 * n];
        hard = new double[4 * n];
        capacitance = new double[4 * n];
        turnOnCurrent = new double[4 * n];
        turnOffCurrent = new double[4 * n];
        freeCurrent = new double[4 * n];

        Modulation modulation = bench.modulation();
        double bus = bench.busVoltage();
        double ambient = bench.ambientTemp();
        double kt = motor.torqueConstant();
        double frictionTorque = motor.frictionTorque();
        double loadInertia = profile.loadInertia();
        double r20 = Copper.resistance20(motor.resistance(), motor.resistanceTemp());
        RippleCache ripples = new RippleCache(modulation, bus, motor.inductance(), frequency);

        // Mechanics: constant within a piece.
        double[] housingLoss = new double[n];
        double[] durations = new double[n];
        double speedMax = 0;
        double energy = 0;
        for (int k = 0; k < n; k++) {
            ProfilePiece p = pieces[k];
            durations[k] = p.duration();
            weight[k] = cycleTime > 0 ? p.duration() / cycleTime : 0;
            motorSpeedStart[k] = ratio * p.speedStart();
            motorSpeedEnd[k] = ratio * p.speedEnd();
            double motorMean = ratio * p.meanSpeed();
            double torque = DcMotor.shaftTorque(p.torque(), p.meanSpeed(), ratio, bench.gearEfficiency(),
                    motor.rotorInertia(), loadInertia, ratio * p.acceleration(), frictionTorque,
                    Math.signum(motorMean));
            motorTorque[k] = torque;
            current[k] = DcMotor.current(torque, kt);
            absCurrent[k] = Math.abs(current[k]);
            frictionLoss[k] = frictionTorque * Math.abs(motorMean);
            brushLoss[k] = motor.brushDrop() * absCurrent[k];
            housingLoss[k] = frictionLoss[k] + brushLoss[k];
            mechanicalPower[k] = p.torque() * p.meanSpeed();
            energy += mechanicalPower[k] * p.duration();
            speedMax = Math.max(speedMax, Math.max(Math.abs(motorSpeedStart[k]), Math.abs(motorSpeedEnd[k])));
        }
        energyOut = energy;

        // Copper loss ↔ winding temperature: the loss is exactly linear in temperature (IEC 60028) and the
        // network solves that coupling in closed form; only the ripple's dependence on R needs passes.
        WindingThermalNetwork network = new WindingThermalNetwork(motor.rthWindingHousing(),
                motor.rthHousingAmbient(), motor.windingHeatCapacity(), motor.housingHeatCapacity());
        double[] lossAtAmbient = new double[n];
        double[] lossSlope = new double[n];
        for (int k = 0; k < n; k++) {
            windingMeanTemp[k] = ambient;
        }
        WindingThermalResponse response = null;
        for (int pass = 0; pass < THERMAL_PASSES; pass++) {
            boolean lossMoved = pass == 0;
            for (int k = 0; k < n; k++) {
                double r = Copper.resistanceAt(motor.resistance(), motor.resistanceTemp(), windingMeanTemp[k]);
                double v0 = DcMotor.terminalVoltage(current[k], r, kt, motorSpeedStart[k], motor.brushDrop());
                double v1 = DcMotor.terminalVoltage(current[k], r, kt, motorSpeedEnd[k], motor.brushDrop());
                double ms = current[k] * current[k] + rippleVariance(ripples, modulation, bus, r, v0, v1);
                double slope = ms * r20 * Copper.ALPHA_20;
                lossMoved |= Math.abs(slope - lossSlope[k]) > LOSS_TOLERANCE * slope;
                lossAtAmbient[k] = ms * r20 * (1 + Copper.ALPHA_20 * (ambient - Copper.REFERENCE_TEMP));
                lossSlope[k] = slope;
            }
            if (!lossMoved) {
                break; // the same losses would give the same temperatures
            }
            response = network.respond(durations, lossAtAmbient, lossSlope, housingLoss, profile.repeat());
            double[] mean = response.meanRise();
            double moved = 0;
            for (int k = 0; k < n; k++) {
                double t = ambient + mean[k];
                moved = Math.max(moved, Math.abs(t - windingMeanTemp[k]));
                windingMeanTemp[k] = t;
            }
            if (moved < THERMAL_TOLERANCE) {
                break;
            }
        }
        windingRunaway = response != null && response.runaway();
        double[] peakRise = response == null ? new double[n] : response.peakRise();

        // Electrical side at the final winding temperatures.
        double vMin = bench.busVoltageMin();
        availableVoltage = ConductionPattern.maxVoltageRatio(modulation, bench.maxDuty()) * vMin;
        double outputFrequency = frequency / ConductionPattern.ripplePeriodFactor(modulation);
        double deadFraction = bench.deadTime() * frequency;
        double sumSquare = 0;
        double peakMax = 0;
        double duty = 0;
        double rippleWorst = 0;
        double powerSum = 0;
        double motorLossSum = 0;
        double gateSum = 0;
        double windingMax = 0;
        double resistanceMax = 0;
        boolean discontinuous = false;
        for (int k = 0; k < n; k++) {
            double r = Copper.resistanceAt(motor.resistance(), motor.resistanceTemp(), windingMeanTemp[k]);
            resistance[k] = r;
            resistanceMax = Math.max(resistanceMax, r);
            double i = current[k];
            double v0 = DcMotor.terminalVoltage(i, r, kt, motorSpeedStart[k], motor.brushDrop());
            double v1 = DcMotor.terminalVoltage(i, r, kt, motorSpeedEnd[k], motor.brushDrop());
            double vMean = (v0 + v1) / 2;
            double vWorst = Math.abs(v1) >= Math.abs(v0) ? v1 : v0;
            worstVoltage[k] = vWorst;
            neededVoltage[k] = Math.abs(vWorst);
            worstDuty[k] = ConductionPattern.reportedDuty(modulation, vWorst / bus);
            duty = Math.max(duty, Math.max(ConductionPattern.highSideDuty(modulation, v0 / bus),
                    ConductionPattern.highSideDuty(modulation, v1 / bus)));

            double variance = rippleVariance(ripples, modulation, bus, r, v0, v1);
            double ms = i * i + variance;
            meanSquare[k] = ms;
            sumSquare += weight[k] * ms;

            // Worst ripple over the ramp: the ripple peaks at an on-fraction of ½ and falls either side.
            double d0 = ConductionPattern.rippleOnFraction(modulation, v0 / bus);
            double d1 = ConductionPattern.rippleOnFraction(modulation, v1 / bus);
            double lo = Math.min(d0, d1);
            double hi = Math.max(d0, d1);
            if (modulation != Modulation.BIPOLAR && v0 * v1 < 0) {
                lo = 0;
            }
            double dStar = Math.max(lo, Math.min(hi, 0.5));
            RippleWaveform w0 = ripples.get(r, d0);
            RippleWaveform w1 = ripples.get(r, d1);
            RippleWaveform ws = ripples.get(r, dStar);
            ripple[k] = Math.max(ws.peakToPeak(), Math.max(w0.peakToPeak(), w1.peakToPeak()));
            // Unipolar and sign-magnitude with V < 0 run the waveform upside down: its extremes are those of
            // the waveform around −I. The half-way waveform is symmetric; a clamped one is an end's.
            double i0 = ConductionPattern.rippleSign(modulation, v0 / bus) * i;
            double i1 = ConductionPattern.rippleSign(modulation, v1 / bus) * i;
            double iStar = dStar == d0 ? i0 : dStar == d1 ? i1 : i;
            peak[k] = Math.max(ws.peak(iStar), Math.max(w0.peak(i0), w1.peak(i1)));
            rippleWorst = Math.max(rippleWorst, ripple[k]);
            peakMax = Math.max(peakMax, peak[k]);
            discontinuous |= ws.crossesZero(iStar) || w0.crossesZero(i0) || w1.crossesZero(i1);

            copperLoss[k] = ms * r;
            terminalPower[k] = i * vMean + variance * r;
            powerSum += weight[k] * terminalPower[k];
            motorLossSum += weight[k] * (copperLoss[k] + frictionLoss[k] + brushLoss[k]);
            windingPeakTemp[k] = ambient + peakRise[k];
            windingMax = Math.max(windingMax, peakRise[k]);

            // Conduction pattern averaged over the piece; the voltage's sign may change once within it.
            int base = 4 * k;
            if (v0 * v1 < 0) {
                double z = v0 / (v0 - v1);
                addPattern(modulation, v0 / 2 / bus, deadFraction, ripples, r, z, ms, base, k);
                addPattern(modulation, v1 / 2 / bus, deadFraction, ripples, r, 1 - z, ms, base, k);
            } else {
                addPattern(modulation, vMean / bus, deadFraction, ripples, r, 1.0, ms, base, k);
            }
            gateSum += weight[k] * switchingCount[k];
        }
        currentRms = Math.sqrt(sumSquare);
        currentPeak = peakMax;
        dutyMax = duty;
        rippleMax = rippleWorst;
        terminalPowerAverage = powerSum;
        motorLossAverage = motorLossSum;
        gateSwitchesAverage = gateSum;

        double windingLimit = motor.maxWindingTemp() - bench.limits().windingTempMargin();
        double hottest = ambient + windingMax;
        double margin = Margins.of(windingLimit, hottest);
        if (windingRunaway && margin > -1) {
            margin = -1;
            hottest = Margins.valueAtMargin(windingLimit, -1);
        }
        windingTempMax = hottest;
        marginWinding = margin;
        marginMotorPeak = Margins.of(motor.peakCurrent(), currentPeak);
        marginSpeed = Margins.of(motor.maxSpeed(), speedMax);
        marginRipple = Margins.of(bench.limits().rippleFraction() * motor.continuousCurrent(), rippleMax);
        marginDuty = Margins.of(bench.maxDuty(), dutyMax);

        // Switch RMS current: the worst position's channel current over the cycle.
        double switchSquare = 0;
        for (int p = 0; p < 4; p++) {
            double s = 0;
            for (int k = 0; k < n; k++) {
                s += weight[k] * conduction[4 * k + p];
            }
            switchSquare = Math.max(switchSquare, s);
        }
        switchRmsCurrent = Math.sqrt(switchSquare);

        int bits = 0;
        if (outputFrequency < AUDIBLE_LIMIT) {
            bits |= dev.yoke.engine.Advisory.AUDIBLE_PWM.bit();
        }
        if (resistanceMax > 0 && motor.inductance() / resistanceMax < ROUGH_PERIODS / outputFrequency) {
            bits |= dev.yoke.engine.Advisory.ROUGH_CURRENT.bit();
        }
        if (discontinuous) {
            bits |= dev.yoke.engine.Advisory.DISCONTINUOUS_CURRENT.bit();
        }
        if (windingRunaway) {
            bits |= dev.yoke.engine.Advisory.WINDING_RUNAWAY.bit();
        }
        advisoryBits = bits;

        // Positions with identical coefficients (bipolar and unipolar pair HA with LB, LA with HB).
        int[] rep = new int[4];
        int[] mult = new int[4];
        int count = 0;
        for (int p = 0; p < 4; p++) {
            int found = -1;
            for (int j = 0; j < count && found < 0; j++) {
                if (samePosition(rep[j], p)) {
                    found = j;
                }
            }
            if (found >= 0) {
                mult[found]++;
            } else {
                rep[count] = p;
                mult[count] = 1;
                count++;
            }
        }
        distinct = java.util.Arrays.copyOf(rep, count);
        multiplicity = java.util.Arrays.copyOf(mult, count);

        // The fast path's cells, piece by piece, distinct positions only, interleaved for locality; a position
        // idle for a whole piece (no current, no edges) loses nothing and is left out.
        double[] packed = new double[CELL * n * count];
        pieceEnd = new int[n];
        int c = 0;
        for (int k = 0; k < n; k++) {
            for (int j = 0; j < count; j++) {
                int at = 4 * k + rep[j];
                if (conduction[at] == 0 && hard[at] == 0 && capacitance[at] == 0 && turnOnCurrent[at] == 0 && turnOffCurrent[at] == 0
                        && freeCurrent[at] == 0) {
                    continue;
                }
                packed[c] = conduction[at];
                packed[c + 1] = capacitance[at];
                packed[c + 2] = hard[at];
                packed[c + 3] = turnOnCurrent[at];
                packed[c + 4] = turnOffCurrent[at];
                packed[c + 5] = freeCurrent[at];
                packed[c + 6] = weight[k] * mult[j];
                c += CELL;
            }
            pieceEnd[k] = c;
        }
        cells = java.util.Arrays.copyOf(packed, c);
    }

    private boolean samePosition(int a, int b) {
        for (int k = 0; k < n; k++) {
            if (!close(conduction[4 * k + a], conduction[4 * k + b]) || !close(hard[4 * k + a], hard[4 * k + b])
                    || !close(capacitance[4 * k + a], capacitance[4 * k + b])
                    || !close(turnOnCurrent[4 * k + a], turnOnCurrent[4 * k + b])
                    || !close(turnOffCurrent[4 * k + a], turnOffCurrent[4 * k + b])
                    || !close(freeCurrent[4 * k + a], freeCurrent[4 * k + b])) {
                return false;
            }
        }
        return true;
    }

    private static boolean close(double x, double y) {
        return Math.abs(x - y) <= 1e-13 * Math.max(Math.abs(x), Math.abs(y));
    }

    /**
     * Adds one conduction pattern's coefficients, weighted by the share of the piece it holds for: each channel's
     * mean square from the exact ripple's interval moments, each body diode's dead-time current and each hard
     * turn-on, decided edge by edge from the signed current at the ripple's extremes
     * ({@link ConductionPattern#channelSquare}, {@link ConductionPattern#deadTimeDiodeCurrent},
     * {@link ConductionPattern#hardTurnOns}, {@link ConductionPattern#outputCapacitanceDumps}), and the current at each hard edge
     * ({@link ConductionPattern#turnOnCurrent}, {@link ConductionPattern#turnOffCurrent}).
     */
    private void addPattern(Modulation modulation, double voltageRatio, double deadFraction, RippleCache ripples,
            double r, double share, double ms, int base, int k) {
        ConductionPattern pattern = ConductionPattern.of(modulation, voltageRatio, current[k], deadFraction);
        RippleWaveform w = ripples.get(r, ConductionPattern.rippleOnFraction(modulation, voltageRatio));
        double i = current[k];
        for (int p = 0; p < 4; p++) {
            conduction[base + p] += share * pattern.channelSquare(p, i, ms, w);
            hard[base + p] += share * pattern.hardTurnOns(p, i, w);
            capacitance[base + p] += share * pattern.outputCapacitanceDumps(p, i, w);
            turnOnCurrent[base + p] += share * pattern.turnOnCurrent(p, i, w);
            turnOffCurrent[base + p] += share * pattern.turnOffCurrent(p, i, w);
            freeCurrent[base + p] += share * pattern.deadTimeDiodeCurrent(p, i, w);
        }
        switchingCount[k] += share * pattern.switchingCount();
    }

    /**
     * The last few ripple waveforms of one motor side, keyed by resistance and on-fraction: ramps and
     * constant-speed pieces ask for the same ones again. Used only while a plan is built.
     */
    private static final class RippleCache {
        private final double swing;
        private final double inductance;
        private final double period;
        private final double[] resistance = new double[4];
        private final double[] onFraction = new double[4];
        private final RippleWaveform[] waveform = new RippleWaveform[4];
        private int next;

        RippleCache(Modulation modulation, double bus, double inductance, double frequency) {
            this.swing = ConductionPattern.rippleSwing(modulation) * bus;
            this.inductance = inductance;
            this.period = ConductionPattern.ripplePeriodFactor(modulation) / frequency;
        }

        RippleWaveform get(double r, double delta) {
            for (int j = 0; j < waveform.length; j++) {
                if (waveform[j] != null && resistance[j] == r && onFraction[j] == delta) {
                    return waveform[j];
                }
            }
            RippleWaveform w = PwmRipple.waveform(swing, r, inductance, delta, period);
            resistance[next] = r;
            onFraction[next] = delta;
            waveform[next] = w;
            next = (next + 1) % waveform.length;
            return w;
        }
    }

    /** Ripple variance averaged over the piece's voltage ramp (Simpson's rule on start, middle and end). */
    private static double rippleVariance(RippleCache ripples, Modulation modulation, double bus, double r, double v0,
            double v1) {
        double vm = (v0 + v1) / 2;
        double a = ripples.get(r, ConductionPattern.rippleOnFraction(modulation, v0 / bus)).variance();
        double b = ripples.get(r, ConductionPattern.rippleOnFraction(modulation, vm / bus)).variance();
        double c = ripples.get(r, ConductionPattern.rippleOnFraction(modulation, v1 / bus)).variance();
        return (a + 4 * b + c) / 6;
    }

    @Override
    public int motorIndex() {
        return motorIndex;
    }

    @Override
    public int frequencyIndex() {
        return frequencyIndex;
    }

    @Override
    public int ratioIndex() {
        return ratioIndex;
    }

    static MotorSidePlan build(int motorIndex, int frequencyIndex, int ratioIndex, Motor motor, Bench bench,
            Profile profile, List<ProfilePiece> pieces) {
        return new MotorSidePlan(motorIndex, frequencyIndex, ratioIndex, motor, bench, profile,
                pieces.toArray(new ProfilePiece[0]));
    }
}
