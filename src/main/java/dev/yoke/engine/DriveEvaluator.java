package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import dev.yoke.physics.ConductionPattern;
import dev.yoke.physics.Copper;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The pairing engine: a brushed DC motor on a PWM H-bridge of four identical MOSFETs, evaluated over a
 * duty profile (motor laws, gearbox, copper resistance against temperature, PWM duty and exact R-L ripple,
 * switch loss mechanisms from the conduction pattern, junction temperatures in closed form, a two-node
 * winding thermal network). Everything that depends on the switch alone is computed in the constructor,
 * everything that depends on the motor, frequency and ratio alone in {@link #prepare}; {@link #summarize}
 * is then a few multiply-adds per piece and switch position and allocates nothing.
 *
 * <p>Conventions: losses are reported at the nominal bus, voltage headroom is checked at the lowest bus
 * with the bridge drop 2·|I|·R_DS(on)(T_j) at the hottest junction of the piece, the V_DS margin at the
 * highest bus. The gate drive is fed from its own supply: reported separately, not in the bus energy.
 * Immutable and safe to share between threads.
 */
public final class DriveEvaluator implements PairingEvaluator {

    private final Scenario scenario;
    private final Catalog catalog;
    private final List<ProfilePiece> pieces;
    private final SwitchConstants[] switches;
    private final double ambient;

    private DriveEvaluator(Scenario scenario, Catalog catalog) {
        this.scenario = scenario;
        this.catalog = catalog;
        this.pieces = List.copyOf(ProfilePiece.split(scenario.profile().segments()));
        Bench bench = scenario.bench();
        this.ambient = bench.ambientTemp();
        List<PowerSwitch> parts = catalog.switches();
        this.switches = new SwitchConstants[parts.size()];
        for (int i = 0; i < switches.length; i++) {
            switches[i] = new SwitchConstants(parts.get(i), bench);
        }
    }

    /** An evaluator for every pairing of the catalog's parts on the scenario's bench and profile. */
    public static PairingEvaluator of(Scenario scenario, Catalog catalog) {
        return new DriveEvaluator(scenario, catalog);
    }

    @Override
    public Scenario scenario() {
        return scenario;
    }

    @Override
    public Catalog catalog() {
        return catalog;
    }

    @Override
    public MotorSide prepare(int motor, int frequency, int ratio) {
        return MotorSidePlan.build(motor, frequency, ratio, catalog.motors().get(motor), scenario.bench(),
                scenario.profile(), pieces);
    }

    /**
     * Steady loss of one cell (piece × position), W: the closed-form fixed point
     * P = (A·R_DS(on)(T_a) + B)/(1 − R_th·A·R_25·α) of P = A·R_DS(on)(T_a + R_th·P) + B
     * ({@link dev.yoke.physics.JunctionTemperature}); when no fixed point exists (runaway) the loss at the
     * reported runaway temperature. The junction is then T_a + R_th·P.
     */
    static double cellLoss(SwitchConstants s, double conductionCoefficient, double otherLoss) {
        double stability = 1.0 - s.runawayFactor * conductionCoefficient;
        if (!(stability > 0)) {
            return conductionCoefficient * s.rdsOnAt(s.runawayJunctionTemp) + otherLoss;
        }
        return (conductionCoefficient * s.rAmbient + otherLoss) / stability;
    }

    /** Junction temperature of a cell from its loss, °C (the runaway report when no fixed point exists). */
    static double cellJunction(SwitchConstants s, double conductionCoefficient, double loss, double ambient) {
        double junction = ambient + s.rth * loss;
        if (!(1.0 - s.runawayFactor * conductionCoefficient > 0)) {
            return Math.max(junction, s.runawayJunctionTemp);
        }
        return junction;
    }

    /** Temperature-independent loss of one cell, W. */
    static double otherLoss(SwitchConstants s, int fi, double capacitance, double hard, double turnOnCurrent,
            double turnOffCurrent, double freeCurrent) {
        return capacitance * s.capacitanceLoss[fi] + hard * s.recoveryLoss[fi]
                + edgeLoss(s, fi, turnOnCurrent, turnOffCurrent) + freeCurrent * s.diodeLossPerAmp[fi];
    }

    /** V·I overlap loss of one cell's hard edges, W ({@link dev.yoke.physics.SwitchLossLaws#hardSwitching}). */
    static double edgeLoss(SwitchConstants s, int fi, double turnOnCurrent, double turnOffCurrent) {
        return turnOnCurrent * s.turnOnLossPerAmp[fi] + turnOffCurrent * s.turnOffLossPerAmp[fi];
    }

    @Override
    public void summarize(MotorSide motorSide, int switchIndex, double[] row) {
        MotorSidePlan plan = (MotorSidePlan) motorSide;
        SwitchConstants s = switches[switchIndex];
        int fi = plan.frequencyIndex;
        double outputCapacitance = s.capacitanceLoss[fi];
        double recovery = s.recoveryLoss[fi];
        double edgeOn = s.turnOnLossPerAmp[fi];
        double edgeOff = s.turnOffLossPerAmp[fi];
        double diode = s.diodeLossPerAmp[fi];
        double factor = s.runawayFactor;
        double rAmbient = s.rAmbient;
        double rth = s.rth;
        double[] cells = plan.cells;
        double[] needed = plan.neededVoltage;
        double[] absCurrent = plan.absCurrent;
        int[] pieceEnd = plan.pieceEnd;
        int n = plan.n;
        double ta = ambient;
        double bridge = 0;
        double tjMax = ta;
        double headroom = Double.POSITIVE_INFINITY;
        boolean runaway = false;
        int c = 0;
        for (int k = 0; k < n; k++) {
            double lossMax = 0;
            boolean pieceRunaway = false;
            for (int end = pieceEnd[k]; c < end; c += MotorSidePlan.CELL) {
                double a = cells[c];
                double b = cells[c + 1] * outputCapacitance + cells[c + 2] * recovery + cells[c + 3] * edgeOn
                        + cells[c + 4] * edgeOff + cells[c + 5] * diode;
                double stability = 1.0 - factor * a;
                double loss;
                if (stability > 0) {
                    loss = (a * rAmbient + b) / stability;
                } else {
                    pieceRunaway = true;
                    loss = cellLoss(s, a, b);
                }
                bridge += cells[c + 6] * loss;
                if (loss > lossMax) {
                    lossMax = loss;
                }
            }
            double tjPiece = ta + rth * lossMax;
            if (pieceRunaway) {
                runaway = true;
                tjPiece = Math.max(tjPiece, s.runawayJunctionTemp);
            }
            if (tjPiece > tjMax) {
                tjMax = tjPiece;
            }
            double left = plan.availableVoltage - needed[k] - 2 * absCurrent[k] * s.rdsOnAt(tjPiece);
            if (left < headroom) {
                headroom = left;
            }
        }
        fill(plan, s, row, bridge, tjMax, headroom, runaway);
    }

    private void fill(MotorSidePlan plan, SwitchConstants s, double[] row, double bridge, double tjMax,
            double headroomVolts, boolean runaway) {
        PowerSwitch q = s.part;
        Motor m = plan.motor;
        int fi = plan.frequencyIndex;
        double gate = plan.gateSwitchesAverage * s.gateLossPerSwitch[fi];
        double energyIn = (plan.terminalPowerAverage + bridge) * plan.cycleTime;
        double marginHeadroom = plan.n == 0 ? Margins.of(plan.availableVoltage, 0)
                : plan.availableVoltage > 0 ? Margins.of(plan.availableVoltage, plan.availableVoltage - headroomVolts)
                : -1.0;
        double marginJunction = Margins.of(s.junctionLimit, tjMax);

        row[Metric.MARGIN_VDS.ordinal()] = s.marginVds;
        row[Metric.MARGIN_SWITCH_PEAK.ordinal()] = Margins.of(q.idPulsed(), plan.currentPeak);
        row[Metric.MARGIN_SWITCH_RMS.ordinal()] = Margins.of(q.idContinuous(), plan.switchRmsCurrent);
        row[Metric.MARGIN_JUNCTION.ordinal()] = marginJunction;
        row[Metric.MARGIN_WINDING.ordinal()] = plan.marginWinding;
        row[Metric.MARGIN_MOTOR_PEAK.ordinal()] = plan.marginMotorPeak;
        row[Metric.MARGIN_SPEED.ordinal()] = plan.marginSpeed;
        row[Metric.MARGIN_HEADROOM.ordinal()] = marginHeadroom;
        row[Metric.MARGIN_RIPPLE.ordinal()] = plan.marginRipple;
        row[Metric.MARGIN_DEAD_TIME.ordinal()] = s.marginDeadTime;
        row[Metric.MARGIN_DUTY.ordinal()] = plan.marginDuty;

        int binding = 0;
        double bindingMargin = row[Metric.MARGIN_VDS.ordinal()];
        int first = Metric.MARGIN_VDS.ordinal();
        for (int c = 1; c < CONSTRAINTS.length; c++) {
            double v = row[first + c];
            if (v < bindingMargin) {
                bindingMargin = v;
                binding = c;
            }
        }
        int bits = plan.advisoryBits;
        if (runaway) {
            bits |= Advisory.SWITCH_RUNAWAY.bit();
        }
        if (marginHeadroom < LOW_HEADROOM) {
            bits |= Advisory.LOW_HEADROOM.bit();
        }
        row[Metric.FEASIBLE.ordinal()] = bindingMargin >= 0 ? 1.0 : 0.0;
        row[Metric.BINDING.ordinal()] = binding;
        row[Metric.BINDING_MARGIN.ordinal()] = bindingMargin;
        row[Metric.ADVISORIES.ordinal()] = bits;
        row[Metric.CURRENT_RMS.ordinal()] = plan.currentRms;
        row[Metric.CURRENT_PEAK.ordinal()] = plan.currentPeak;
        row[Metric.DUTY_MAX.ordinal()] = plan.dutyMax;
        row[Metric.RIPPLE_PP.ordinal()] = plan.rippleMax;
        row[Metric.BRIDGE_LOSS.ordinal()] = bridge;
        row[Metric.MOTOR_LOSS.ordinal()] = plan.motorLossAverage;
        row[Metric.GATE_DRIVE_LOSS.ordinal()] = gate;
        row[Metric.TOTAL_LOSS.ordinal()] = bridge + plan.motorLossAverage + gate;
        row[Metric.EFFICIENCY.ordinal()] = efficiency(energyIn, plan.energyOut);
        row[Metric.ENERGY_IN.ordinal()] = energyIn;
        row[Metric.ENERGY_OUT.ordinal()] = plan.energyOut;
        row[Metric.JUNCTION_TEMP_MAX.ordinal()] = tjMax;
        row[Metric.WINDING_TEMP_MAX.ordinal()] = plan.windingTempMax;
        row[Metric.COST.ordinal()] = m.price() + 4 * q.price();
        row[Metric.MASS.ordinal()] = m.mass();
    }

    /** Shared copy of {@code Constraint.values()}: the enum hands out a fresh array on every call. */
    private static final Constraint[] CONSTRAINTS = Constraint.values();

    /** Headroom margin below which {@link Advisory#LOW_HEADROOM} is raised (common practice: keep 10 % for control). */
    static final double LOW_HEADROOM = 0.10;

    /**
     * Mechanical energy out over bus energy in while the bus supplies the cycle; when the load supplies
     * it (both negative, a generating cycle) the ratio is inverted: energy returned over energy taken
     * from the load. Zero when neither reading makes sense. Always within [0, 1] for a lossy drive.
     */
    static double efficiency(double energyIn, double energyOut) {
        if (energyIn > 0 && energyOut >= 0) {
            return energyOut / energyIn;
        }
        if (energyIn < 0 && energyOut < 0) {
            return energyIn / energyOut;
        }
        return 0.0;
    }

    @Override
    public PairingResult explain(int motor, int switchIndex, int frequency, int ratio) {
        return explain(prepare(motor, frequency, ratio), switchIndex);
    }

    /** The detailed evaluation of one switch on an already prepared motor side (saves preparing it again). */
    public PairingResult explain(MotorSide motorSide, int switchIndex) {
        MotorSidePlan plan = (MotorSidePlan) motorSide;
        int frequency = plan.frequencyIndex;
        SwitchConstants s = switches[switchIndex];
        double[] row = new double[Metric.COUNT];
        summarize(plan, switchIndex, row);
        int segmentCount = scenario.profile().segments().size();
        List<SegmentResult> segments = new ArrayList<>(segmentCount);
        int k = 0;
        for (int seg = 0; seg < segmentCount; seg++) {
            SegmentAccumulator acc = new SegmentAccumulator(scenario.profile().segments().get(seg).label());
            while (k < plan.n && plan.pieces[k].segmentIndex() == seg) {
                acc.add(plan, s, k, frequency, ambient);
                k++;
            }
            segments.add(acc.result(plan, s, frequency, ambient));
        }
        Map<Constraint, Double> margins = new EnumMap<>(Constraint.class);
        for (Constraint c : Constraint.values()) {
            margins.put(c, row[Metric.marginOf(c).ordinal()]);
        }
        Set<Advisory> advisories = EnumSet.noneOf(Advisory.class);
        int bits = (int) row[Metric.ADVISORIES.ordinal()];
        for (Advisory a : Advisory.values()) {
            if ((bits & a.bit()) != 0) {
                advisories.add(a);
            }
        }
        Totals totals = new Totals(row[Metric.CURRENT_RMS.ordinal()], row[Metric.CURRENT_PEAK.ordinal()],
                row[Metric.DUTY_MAX.ordinal()], row[Metric.RIPPLE_PP.ordinal()], row[Metric.BRIDGE_LOSS.ordinal()],
                row[Metric.MOTOR_LOSS.ordinal()], row[Metric.GATE_DRIVE_LOSS.ordinal()],
                row[Metric.EFFICIENCY.ordinal()], row[Metric.ENERGY_IN.ordinal()], row[Metric.ENERGY_OUT.ordinal()],
                row[Metric.JUNCTION_TEMP_MAX.ordinal()], row[Metric.WINDING_TEMP_MAX.ordinal()],
                row[Metric.COST.ordinal()], row[Metric.MASS.ordinal()]);
        return new PairingResult(plan.motor, s.part, plan.frequency, plan.ratio, margins,
                CONSTRAINTS[(int) row[Metric.BINDING.ordinal()]], advisories, totals, segments);
    }

    /** Collects the pieces of one segment into its {@link SegmentResult}: time averages and worst points. */
    private static final class SegmentAccumulator {
        private final String label;
        private double duration;
        private double speed;
        private double torque;
        private double currentSum;
        private double voltage;
        private double duty;
        private double ripple;
        private double meanSquare;
        private double peak;
        private double windingSum;
        private double windingPeak = Double.NEGATIVE_INFINITY;
        private final double[][] loss = new double[4][5];
        private final double[] junction = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        private double copper;
        private double friction;
        private double brush;
        private double gateSwitches;
        private double mechanical;
        private double bus;

        SegmentAccumulator(String label) {
            this.label = label;
        }

        void add(MotorSidePlan plan, SwitchConstants s, int k, int fi, double ambient) {
            double t = plan.pieces[k].duration();
            duration += t;
            if (Math.abs(plan.motorSpeedStart[k]) > Math.abs(speed)) {
                speed = plan.motorSpeedStart[k];
            }
            if (Math.abs(plan.motorSpeedEnd[k]) > Math.abs(speed)) {
                speed = plan.motorSpeedEnd[k];
            }
            torque += t * plan.motorTorque[k];
            currentSum += t * plan.current[k];
            if (Math.abs(plan.worstVoltage[k]) >= Math.abs(voltage)) {
                voltage = plan.worstVoltage[k];
                duty = plan.worstDuty[k];
            }
            ripple = Math.max(ripple, plan.ripple[k]);
            meanSquare += t * plan.meanSquare[k];
            peak = Math.max(peak, plan.peak[k]);
            windingSum += t * plan.windingMeanTemp[k];
            windingPeak = Math.max(windingPeak, plan.windingPeakTemp[k]);
            double bridge = 0;
            for (int p = 0; p < 4; p++) {
                int c = 4 * k + p;
                double a = plan.conduction[c];
                double b = otherLoss(s, fi, plan.capacitance[c], plan.hard[c], plan.turnOnCurrent[c], plan.turnOffCurrent[c],
                        plan.freeCurrent[c]);
                double cell = cellLoss(s, a, b);
                double tj = cellJunction(s, a, cell, ambient);
                double[] l = loss[p];
                l[0] += t * (cell - b);
                l[1] += t * edgeLoss(s, fi, plan.turnOnCurrent[c], plan.turnOffCurrent[c]);
                l[2] += t * plan.capacitance[c] * s.capacitanceLoss[fi];
                l[3] += t * plan.freeCurrent[c] * s.diodeLossPerAmp[fi];
                l[4] += t * plan.hard[c] * s.recoveryLoss[fi];
                junction[p] = Math.max(junction[p], tj);
                bridge += cell;
            }
            copper += t * plan.copperLoss[k];
            friction += t * plan.frictionLoss[k];
            brush += t * plan.brushLoss[k];
            gateSwitches += t * plan.switchingCount[k];
            mechanical += t * plan.mechanicalPower[k];
            bus += t * (plan.terminalPower[k] + bridge);
        }

        SegmentResult result(MotorSidePlan plan, SwitchConstants s, int fi, double ambient) {
            double d = duration > 0 ? duration : 1;
            List<SwitchLoss> losses = new ArrayList<>(4);
            for (int p = 0; p < 4; p++) {
                double[] l = loss[p];
                losses.add(new SwitchLoss(ConductionPattern.POSITION_NAMES[p], l[0] / d, l[1] / d, l[2] / d,
                        l[3] / d, l[4] / d));
            }
            double windingMean = duration > 0 ? windingSum / d : ambient;
            double[] tj = junction.clone();
            for (int p = 0; p < 4; p++) {
                if (tj[p] == Double.NEGATIVE_INFINITY) {
                    tj[p] = ambient;
                }
            }
            return new SegmentResult(label, duration, speed, torque / d, currentSum / d, voltage, duty, ripple,
                    Math.sqrt(meanSquare / d), peak,
                    Copper.resistanceAt(plan.motor.resistance(), plan.motor.resistanceTemp(), windingMean),
                    windingMean, windingPeak == Double.NEGATIVE_INFINITY ? windingMean : windingPeak, losses, tj,
                    (copper + friction + brush) / d, copper / d, friction / d,
                    gateSwitches / d * s.gateLossPerSwitch[fi], mechanical / d, bus / d);
        }
    }
}
