package dev.yoke.engine;

import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;

/** Test helper: a copy of a record with one component replaced, by name. */
final class Records {

    private Records() {
    }

    @SuppressWarnings("unchecked")
    static <R extends Record> R with(R record, String component, Object value) {
        try {
            RecordComponent[] parts = record.getClass().getRecordComponents();
            Object[] args = new Object[parts.length];
            Class<?>[] types = new Class<?>[parts.length];
            boolean found = false;
            for (int i = 0; i < parts.length; i++) {
                types[i] = parts[i].getType();
                if (parts[i].getName().equals(component)) {
                    args[i] = value;
                    found = true;
                } else {
                    args[i] = parts[i].getAccessor().invoke(record);
                }
            }
            if (!found) {
                throw new IllegalArgumentException("no component " + component + " in " + record.getClass());
            }
            Constructor<?> c = record.getClass().getDeclaredConstructor(types);
            return (R) c.newInstance(args);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }
}
