package dev.yoke.model;

import java.util.List;

/**
 * The drive set-up a pairing is judged on, in SI units (temperatures in °C).
 *
 * @param busVoltage            nominal bus voltage, V (losses are reported here)
 * @param busVoltageMin         lowest bus voltage, V (voltage headroom is checked here)
 * @param busVoltageMax         highest bus voltage, V (V_DS margin is checked here)
 * @param pwmFrequencies        candidate switching frequencies, Hz
 * @param modulation            switching scheme
 * @param deadTime              gap between one switch of a leg turning off and the other turning on, s
 * @param gateDriveVoltage      gate driver supply, V
 * @param gateResistance        external gate resistance, Ω
 * @param maxDuty               largest duty the driver can hold (bootstrap supplies cap it below 1)
 * @param ambientTemp           °C
 * @param switchRthCaseAmbient  each switch's case-to-ambient thermal resistance (heatsink, copper), K/W
 * @param gearRatios            candidate reductions N (motor speed = N × load speed)
 * @param gearEfficiency        gearbox efficiency η, 0 &lt; η ≤ 1
 * @param limits                derating rules
 */
public record Bench(
        double busVoltage,
        double busVoltageMin,
        double busVoltageMax,
        List<Double> pwmFrequencies,
        Modulation modulation,
        double deadTime,
        double gateDriveVoltage,
        double gateResistance,
        double maxDuty,
        double ambientTemp,
        double switchRthCaseAmbient,
        List<Double> gearRatios,
        double gearEfficiency,
        Limits limits) {

    public Bench {
        pwmFrequencies = List.copyOf(pwmFrequencies);
        gearRatios = List.copyOf(gearRatios);
    }
}
