package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The switch loss and junction temperature laws against the worked examples of a power-electronics
 * textbook: M. H. Rashid, <i>Power Electronics: Devices, Circuits, and Applications</i>, 4th ed., Pearson,
 * chapter 4 (power transistors), Examples 4.2, 4.4 and 4.5. The given data and the printed answers below were
 * recalled from memory and then checked against a public transcription of those examples (the FOSSEE Scilab
 * textbook companion of the 4th edition), which reproduces the book's given data and solution steps.
 *
 * <p>Where the book's device is a bipolar transistor, only the part of the example that does not depend on
 * the device kind is used: the thermal path, the energy stored in a capacitor, V·I integrated over linear
 * switching edges, and the conduction loss of a device with a fixed on-state drop.
 */
class TextbookWorkedExamplesTest {

    // ---------------------------------------------------------------- Example 4.4: the thermal path

    /** Example 4.4 data: T_J = 150 °C, T_A = 25 °C, R_JC = 0.4, R_CS = 0.1, R_SA = 0.5 °C/W. */
    private static final double EX44_JUNCTION = 150;
    private static final double EX44_AMBIENT = 25;
    private static final double EX44_RJC = 0.4;
    private static final double EX44_RCS = 0.1;
    private static final double EX44_RSA = 0.5;
    /** Example 4.4 answer (a): maximum dissipation P_T = (T_J − T_A)/(R_JC + R_CS + R_SA) = 125 W. */
    private static final double EX44_POWER = 125;
    /** Example 4.4 answer (b): case temperature T_C = T_J − P_T·R_JC = 100 °C. */
    private static final double EX44_CASE = 100;

    /**
     * Rashid Example 4.4: 125 W through the series path 0.4 + 0.1 + 0.5 °C/W from 25 °C puts the junction at
     * 150 °C. Loss independent of temperature (no conduction term), so the closed form reduces to the
     * thermal Ohm's law the example uses. The book's figures are exact in decimal: tolerance 1e-9 °C is
     * floating-point rounding only.
     */
    @Test
    void junctionTemperatureMatchesTheThermalPathExample() {
        double rth = EX44_RJC + EX44_RCS + EX44_RSA;
        assertEquals(EX44_JUNCTION, JunctionTemperature.steady(EX44_AMBIENT, rth, 0, 0.01, 0.006, EX44_POWER), 1e-9);
        // answer (b): the case sits at the junction minus the drop across R_JC, i.e. ambient plus the drop
        // across the rest of the path; both routes must give the book's 100 °C
        double caseFromJunction = EX44_JUNCTION - EX44_POWER * EX44_RJC;
        double caseFromAmbient = EX44_AMBIENT + EX44_POWER * (EX44_RCS + EX44_RSA);
        assertEquals(EX44_CASE, caseFromJunction, 1e-9);
        assertEquals(EX44_CASE, caseFromAmbient, 1e-9);
    }

    /**
     * Rashid Example 4.4 turned into a MOSFET design check: a conduction loss I²·R_DS(on)(T_j) that reaches the
     * book's 125 W budget exactly at the book's 150 °C junction must give a steady junction of exactly
     * 150 °C through the closed form, whatever share of the budget is conduction and whatever the R_DS(on)
     * slope (R_DS(on) rising with temperature, common practice: ×1.4 to ×2 from 25 to 150 °C). This checks
     * the temperature-dependent fixed point against the example's answer; tolerance 1e-9 °C is rounding.
     */
    @Test
    void temperatureDependentConductionLossLandsOnTheExampleBudget() {
        double rth = EX44_RJC + EX44_RCS + EX44_RSA;
        double r25 = 4e-3;
        for (double hotFactor : new double[] {1.4, 1.7, 2.0}) {
            double alpha = (hotFactor - 1) / 125.0;
            for (double conductionShare : new double[] {0.2, 0.6, 1.0}) {
                double conduction = conductionShare * EX44_POWER;
                double otherLoss = EX44_POWER - conduction;
                // A = mean-square current × on-fraction chosen so that A·R_DS(on)(150 °C) is the conduction share
                double a = conduction / (r25 * (1 + alpha * (EX44_JUNCTION - 25)));
                double tj = JunctionTemperature.steady(EX44_AMBIENT, rth, a, r25, alpha, otherLoss);
                assertEquals(EX44_JUNCTION, tj, 1e-9, "hot×" + hotFactor + " share " + conductionShare);
            }
        }
    }

    // ---------------------------------------------------------------- Example 4.5: capacitor energy each period

    /**
     * Rashid Example 4.5 (snubber for a 220 V, 100 A chopper at 10 kHz, t_f = 1.2 µs): the capacitor that
     * limits dv/dt is C_s = I_L·t_f/V_s = 0.545 µF and the energy it dumps each period costs
     * P_s = ½·C_s·V_s²·f_s = 132 W. Our output-capacitance loss is the same law (the C_oss charge is dumped in
     * the channel at every hard turn-on). Computed from the example's given data the answer is 132.0 W;
     * the book rounds C_s before multiplying, hence the 0.1 W tolerance (below the book's own rounding).
     */
    @Test
    void capacitiveSwitchingLossMatchesTheSnubberExample() {
        double vs = 220;
        double load = 100;
        double fallTime = 1.2e-6;
        double frequency = 10e3;
        double capacitance = load * fallTime / vs;
        assertEquals(0.545e-6, capacitance, 0.001e-6);
        assertEquals(132.0, SwitchLossLaws.outputCapacitance(capacitance, vs, frequency), 0.1);
    }

    // ---------------------------------------------------------------- Example 4.2: V·I over linear edges

    /** Example 4.2 data: V_CC = 250 V, I_CS = 100 A, V_CE(sat) = 2 V, t_d = 0.5, t_r = 1, t_s = 5, t_f = 3 µs. */
    private static final double EX42_VCC = 250;
    private static final double EX42_ICS = 100;
    private static final double EX42_VSAT = 2;
    private static final double EX42_ICEO = 3e-3;
    private static final double EX42_DELAY = 0.5e-6;
    private static final double EX42_RISE = 1e-6;
    private static final double EX42_STORAGE = 5e-6;
    private static final double EX42_FALL = 3e-6;
    /** Example 4.2: f_s = 10 kHz at duty cycle k = 50 %. */
    private static final double EX42_FREQUENCY = 10e3;
    private static final double EX42_DUTY = 0.5;

    /** Adaptive Gauss–Legendre from Commons Math: an integrator independent of our closed forms. */
    private static double integrate(DoubleUnaryOperator f, double from, double to) {
        UnivariateIntegrator integrator = new IterativeLegendreGaussIntegrator(5, 1e-13, 1e-15);
        return integrator.integrate(10_000, f::applyAsDouble, from, to);
    }

    /**
     * Rashid Example 4.2 (resistive load, linear edges): the printed answers P_d = 3.75 mW during the delay,
     * P_r = 42.33 W during the current rise (v_CE falls from V_CC to V_CE(sat) as i_C rises to I_CS) and
     * P_f = 125 W during the current fall (v_CE rises from 0 to V_CC). Integrating v·i numerically reproduces
     * them, which qualifies the integrator as the reference for the clamped-inductive edges below.
     * Tolerance: the book prints 42.33, so ±0.005 W; the other two are exact in decimal.
     */
    @Test
    void integratedEdgeEnergiesReproduceTheBookSwitchingLosses() {
        double delayLoss = EX42_FREQUENCY * integrate(t -> EX42_ICEO * EX42_VCC, 0, EX42_DELAY);
        assertEquals(3.75e-3, delayLoss, 1e-12);

        DoubleUnaryOperator riseCurrent = t -> EX42_ICS * t / EX42_RISE;
        DoubleUnaryOperator riseVoltage = t -> EX42_VCC - (EX42_VCC - EX42_VSAT) * t / EX42_RISE;
        double riseLoss = EX42_FREQUENCY
                * integrate(t -> riseCurrent.applyAsDouble(t) * riseVoltage.applyAsDouble(t), 0, EX42_RISE);
        assertEquals(42.33, riseLoss, 0.005);

        double fallLoss = EX42_FREQUENCY
                * integrate(t -> EX42_ICS * (1 - t / EX42_FALL) * EX42_VCC * t / EX42_FALL, 0, EX42_FALL);
        assertEquals(125.0, fallLoss, 1e-9);
    }

    /**
     * Rashid Example 4.2, conduction and storage: with a fixed on-state drop V_CE(sat) = 2 V at 100 A the book
     * finds P_n = 97 W over t_n = k·T − t_d − t_r = 48.5 µs and P_s = 10 W over the 5 µs storage time. A MOSFET
     * channel is a resistance, so the same loss is our conduction law with R = V/I = 20 mΩ at I_rms = I:
     * on-fraction × I² × R. Exact in decimal: tolerance 1e-9 W.
     */
    @Test
    void conductionLossMatchesTheBookOnStateLoss() {
        double onResistance = EX42_VSAT / EX42_ICS;
        double conductionTime = EX42_DUTY / EX42_FREQUENCY - EX42_DELAY - EX42_RISE;
        assertEquals(97.0, SwitchLossLaws.conduction(conductionTime * EX42_FREQUENCY, EX42_ICS * EX42_ICS,
                onResistance), 1e-9);
        assertEquals(10.0, SwitchLossLaws.conduction(EX42_STORAGE * EX42_FREQUENCY, EX42_ICS * EX42_ICS,
                onResistance), 1e-9);
    }

    /**
     * The clamped-inductive edges of a bridge leg (Mohan, Undeland &amp; Robbins, <i>Power Electronics</i>,
     * 3rd ed., ch. 2, the generic controllable switch with its linearised waveforms and eq. 2-6; from
     * memory): at turn-on the current rises to I_o while the switch still blocks V_d, then the voltage falls
     * at I_o; at turn-off the voltage rises first at I_o, then the current falls at V_d. Integrated with the integrator qualified on Example 4.2 above, these
     * waveforms must give exactly our ½·V·I·(t_on + t_off)·f, here with the book's 250 V, 100 A, 10 kHz and
     * edge times split unevenly between current and voltage. Tolerance 1e-9 relative: quadrature rounding.
     */
    @Test
    void hardSwitchingLawEqualsTheIntegratedClampedInductiveEdges() {
        double v = EX42_VCC;
        double i = EX42_ICS;
        double f = EX42_FREQUENCY;
        for (double[] edges : new double[][] {{EX42_RISE, EX42_FALL, 0.3e-6, 0.7e-6}, {0.2e-6, 0.1e-6, 2e-6, 1e-6}}) {
            double currentRise = edges[0];
            double voltageFall = edges[1];
            double voltageRise = edges[2];
            double currentFall = edges[3];
            double turnOn = integrate(t -> v * i * t / currentRise, 0, currentRise)
                    + integrate(t -> v * (1 - t / voltageFall) * i, 0, voltageFall);
            double turnOff = integrate(t -> v * t / voltageRise * i, 0, voltageRise)
                    + integrate(t -> v * i * (1 - t / currentFall), 0, currentFall);
            double integrated = (turnOn + turnOff) * f;
            double law = SwitchLossLaws.hardSwitching(v, i, currentRise + voltageFall, voltageRise + currentFall, f);
            assertEquals(integrated, law, integrated * 1e-9);
        }
    }
}
