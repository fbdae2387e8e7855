package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.engine.BridgeConductionNgspiceTest.Case;
import dev.yoke.model.Catalog;
import dev.yoke.model.Modulation;
import dev.yoke.model.PowerSwitch;
import dev.yoke.physics.Ngspice;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The C_oss energy Yoke charges to a turn-on at exactly zero current ({@link dev.yoke.physics.ConductionPattern
 * #outputCapacitanceDumps}) against the ngspice circuit simulator (Debian package {@code ngspice}): one leg on a
 * 24 V bus, two voltage-controlled switches ({@code SW} model, R_on = 100 Ω, R_off = 100 MΩ), a linear 500 pF
 * capacitor across each, nothing connected to the midpoint (zero load current), gates driven in complement with
 * a 500 ns dead time at 20 kHz. {@code .meas ... INTEG} of V·I in each switch over two periods after one of
 * warm-up gives the energy each switch's resistance dissipates, i.e. the energy of its two turn-ons.
 *
 * <p>R_on is not the part's: the energy lost charging and discharging a capacitor through a resistance does not
 * depend on the resistance once the charge is complete (here τ = R_on·2C = 100 ns against 24 µs of on-time), and
 * 100 Ω keeps every edge well resolved at a 1 ns step. No body diodes are in the netlist: with no current the
 * midpoint never leaves the rails, so none would conduct, which is why Yoke charges no Q_rr here.
 */
class ZeroCurrentLegNgspiceTest {

    private static final double BUS = 24;
    private static final double F = 20e3;
    private static final double CAPACITANCE = 500e-12;
    private static final int MEASURED_PERIODS = 2;
    /**
     * 1 %: halving the timestep moves the simulated energy by 0.12 %, and R_off's leakage while a switch blocks
     * adds V²/R_off·T/2 = 0.14 nJ per period (0.05 % of C·V² = 288 nJ). Measured: within 0.05 %.
     */
    private static final double TOLERANCE = 0.01;

    static String netlist() {
        double period = 1 / F;
        double dead = 500e-9;
        double on = period / 2 - dead;
        return String.join("\n",
                "zero-current leg: linear C_oss across each switch, nothing on the midpoint",
                "VBUS bus 0 DC " + BUS,
                "VSH bus sh DC 0",
                "SH sh node gh 0 swm",
                "VSL node sl DC 0",
                "SL sl 0 gl 0 swm",
                String.format(Locale.ROOT, "CH bus node %.6e", CAPACITANCE),
                String.format(Locale.ROOT, "CL node 0 %.6e", CAPACITANCE),
                ".model swm sw vt=0.5 vh=0 ron=100 roff=1e8",
                String.format(Locale.ROOT, "VGH gh 0 PULSE(0 1 %.6e 10n 10n %.6e %.6e)", dead, on, period),
                String.format(Locale.ROOT, "VGL gl 0 PULSE(0 1 %.6e 10n 10n %.6e %.6e)", period / 2 + dead, on,
                        period),
                ".ic v(node)=0",
                String.format(Locale.ROOT, ".tran 1n %.6e %.6e 1n uic", (1 + MEASURED_PERIODS) * period, period),
                String.format(Locale.ROOT, ".meas tran ehigh INTEG par('v(sh,node)*i(VSH)') from=%.6e to=%.6e",
                        period, (1 + MEASURED_PERIODS) * period),
                String.format(Locale.ROOT, ".meas tran elow INTEG par('v(sl)*i(VSL)') from=%.6e to=%.6e",
                        period, (1 + MEASURED_PERIODS) * period),
                String.format(Locale.ROOT, ".meas tran ebus INTEG par('-v(bus)*i(VBUS)') from=%.6e to=%.6e",
                        period, (1 + MEASURED_PERIODS) * period),
                ".end", "");
    }

    @Test
    void eachZeroCurrentTurnOnDissipatesBothOutputCapacitancesAsNgspiceMeasures() {
        Ngspice.requireInstalled();
        Map<String, Double> measured = Ngspice.measure(netlist());
        double high = measured.get("ehigh") / MEASURED_PERIODS; // J per period: one turn-on of the high switch
        double low = measured.get("elow") / MEASURED_PERIODS;
        double bus = measured.get("ebus") / MEASURED_PERIODS;

        // Yoke: unipolar at V = 0 with the motor at rest is a leg switching at exactly zero current, no ripple.
        PowerSwitch q = BridgeConductionNgspiceTest.powerSwitch();
        assertEquals(CAPACITANCE, q.outputCapacitance(), 0.0, "the netlist's capacitance is the part's C_oss");
        Case rest = new Case(Modulation.UNIPOLAR, 0.0, 0.0, 1);
        Catalog catalog = new Catalog(List.of(BridgeConductionNgspiceTest.motor(rest)), List.of(q));
        SegmentResult y = DriveEvaluator.of(BridgeConductionNgspiceTest.scenario(rest), catalog)
                .explain(0, 0, 0, 0).segments().get(0);
        double highYoke = y.switchLosses().get(0).outputCapacitance() / F;
        double lowYoke = y.switchLosses().get(1).outputCapacitance() / F;

        assertEquals(high, highYoke, TOLERANCE * high, "high switch: J per turn-on, ngspice");
        assertEquals(low, lowYoke, TOLERANCE * low, "low switch: J per turn-on, ngspice");
        // Energy balance in the simulation: all the bus delivers per period is lost in the two switches
        // (the capacitors end each period as they began). 1 %: as above.
        assertEquals(bus, high + low, TOLERANCE * bus, "bus energy = switch energy, ngspice");
        // Hand algebra: C·V² per turn-on (Erickson & Maksimović, ch. 4, from memory), 288 nJ.
        assertEquals(CAPACITANCE * BUS * BUS, high, TOLERANCE * high, "C·V² per turn-on");
    }
}
