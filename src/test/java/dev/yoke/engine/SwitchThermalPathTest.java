package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.model.Bench;
import dev.yoke.model.Modulation;
import dev.yoke.model.PowerSwitch;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The engine's own junction solution (the fast path's closed form, separate code from
 * {@link dev.yoke.physics.JunctionTemperature}) against the thermal-path worked example of M. H. Rashid,
 * <i>Power Electronics: Devices, Circuits, and Applications</i>, 4th ed., Example 4.4 (recalled from memory,
 * checked against a public transcription): T_A = 25 °C, R_JC = 0.4 °C/W on the part, R_CS + R_SA = 0.1 + 0.5
 * °C/W on the bench, and 125 W put the junction at 150 °C.
 */
class SwitchThermalPathTest {

    private static final double AMBIENT = 25;
    private static final double BOOK_POWER = 125;
    private static final double BOOK_JUNCTION = 150;

    /** An invented switch whose only figures that matter here are R_th,jc = 0.4 K/W and its R_DS(on) line. */
    private static PowerSwitch partWithBookJunctionToCase(double rdsOn, double rdsOnHot) {
        return new PowerSwitch("q-book", "thermal path", "pkg", 60, 50, 200, rdsOn, rdsOnHot, 150,
                40e-9, 10e-9, 12e-9, 4.5, 1.0, 500e-12, 0.9, 50e-9, 0.4, 175, 1.0);
    }

    /** A bench at the book's 25 °C ambient whose case-to-ambient path is the book's R_CS + R_SA = 0.6 K/W. */
    private static Bench benchWithBookHeatsink() {
        return new Bench(24, 20, 29, List.of(20e3), Modulation.SIGN_MAGNITUDE, 300e-9, 12, 4.7, 0.97, AMBIENT,
                0.1 + 0.5, List.of(5.0), 0.85, TestParts.limits());
    }

    /** Temperature-independent loss: the engine sums the part's and the bench's resistances as the book does. */
    @Test
    void engineJunctionMatchesTheBookThermalPath() {
        SwitchConstants s = new SwitchConstants(partWithBookJunctionToCase(5e-3, 9e-3), benchWithBookHeatsink());
        assertEquals(1.0, s.rth, 1e-12);
        double loss = DriveEvaluator.cellLoss(s, 0, BOOK_POWER);
        assertEquals(BOOK_POWER, loss, 1e-9);
        assertEquals(BOOK_JUNCTION, DriveEvaluator.cellJunction(s, 0, loss, AMBIENT), 1e-9);
    }

    /**
     * With R_DS(on) rising from 5 to 9 mΩ between 25 and 150 °C, a conduction coefficient A chosen so that
     * A·R_DS(on)(150 °C) plus the switching share is the book's 125 W must settle at the book's 150 °C: the
     * engine's fixed point, not a forward evaluation, has to find the example's answer. Tolerance 1e-9 °C
     * (rounding only).
     */
    @Test
    void engineFixedPointLandsOnTheBookJunctionWithHotterResistance() {
        SwitchConstants s = new SwitchConstants(partWithBookJunctionToCase(5e-3, 9e-3), benchWithBookHeatsink());
        for (double switchingShare : new double[] {0, 25, 80}) {
            double a = (BOOK_POWER - switchingShare) / s.rdsOnAt(BOOK_JUNCTION);
            double loss = DriveEvaluator.cellLoss(s, a, switchingShare);
            assertEquals(BOOK_POWER, loss, 1e-9, "switching share " + switchingShare);
            assertEquals(BOOK_JUNCTION, DriveEvaluator.cellJunction(s, a, loss, AMBIENT), 1e-9);
        }
    }
}
