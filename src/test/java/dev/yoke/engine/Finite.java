package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.RecordComponent;

/** Walks a result record and asserts that every double in it is finite. */
final class Finite {

    private Finite() {
    }

    static void check(PairingResult r) {
        r.margins().forEach((c, v) -> assertTrue(Double.isFinite(v), "margin " + c));
        record(r.totals(), "totals");
        for (SegmentResult s : r.segments()) {
            record(s, "segment " + s.label());
            for (SwitchLoss l : s.switchLosses()) {
                record(l, "segment " + s.label() + " " + l.position());
            }
        }
        assertTrue(Double.isFinite(r.pwmFrequency()) && Double.isFinite(r.gearRatio()));
    }

    static void record(Record rec, String where) {
        try {
            for (RecordComponent c : rec.getClass().getRecordComponents()) {
                Object v = c.getAccessor().invoke(rec);
                if (v instanceof Double d) {
                    assertTrue(Double.isFinite(d), where + " " + c.getName() + " = " + d);
                } else if (v instanceof double[] arr) {
                    for (double d : arr) {
                        assertTrue(Double.isFinite(d), where + " " + c.getName() + " has " + d);
                    }
                }
            }
        } catch (ReflectiveOperationException ex) {
            throw new AssertionError(ex);
        }
    }
}
