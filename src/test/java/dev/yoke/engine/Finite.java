package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Method;
import java.lang.reflect.RecordComponent;

/** Walks a result record and asserts that every double in it is finite. */
final class Finite {

    private static final ClassValue<Method[]> ACCESSORS = new ClassValue<>() {
        @Override
        protected Method[] computeValue(Class<?> type) {
            RecordComponent[] parts = type.getRecordComponents();
            Method[] methods = new Method[parts.length];
            for (int i = 0; i < parts.length; i++) {
                methods[i] = parts[i].getAccessor();
            }
            return methods;
        }
    };

    private Finite() {
    }

    static void check(PairingResult r) {
        r.margins().forEach((c, v) -> assertTrue(Double.isFinite(v), () -> "margin " + c));
        record(r.totals(), "totals");
        for (SegmentResult s : r.segments()) {
            record(s, s.label());
            for (SwitchLoss l : s.switchLosses()) {
                record(l, s.label());
            }
        }
        assertTrue(Double.isFinite(r.pwmFrequency()) && Double.isFinite(r.gearRatio()));
    }

    static void record(Record rec, String where) {
        try {
            for (Method accessor : ACCESSORS.get(rec.getClass())) {
                Object v = accessor.invoke(rec);
                if (v instanceof Double d) {
                    assertTrue(Double.isFinite(d), () -> where + " " + accessor.getName() + " = " + d);
                } else if (v instanceof double[] arr) {
                    for (double d : arr) {
                        assertTrue(Double.isFinite(d), () -> where + " " + accessor.getName() + " has " + d);
                    }
                }
            }
        } catch (ReflectiveOperationException ex) {
            throw new AssertionError(ex);
        }
    }
}
