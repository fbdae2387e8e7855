package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** The field table editors use validates exactly as the loader does. */
class FieldSpecTest {

    @Test
    void motorTableHoldsEveryKeyOfTheFormat() {
        Set<String> keys = PartFields.of(PartKind.MOTOR).stream().map(FieldSpec::key).collect(Collectors.toSet());
        assertEquals(Set.of("id", "label", "nominal_voltage", "resistance", "resistance_temp", "inductance",
                "torque_constant", "back_emf_constant", "speed_constant", "no_load_current", "continuous_current",
                "peak_current", "max_speed", "rotor_inertia", "rth_winding_housing", "rth_housing_ambient",
                "tau_winding", "tau_housing", "max_winding_temp", "brush_drop", "mass", "price"), keys);
    }

    @Test
    void validateReturnsSiValueOrMessage() {
        FieldSpec r = PartFields.find(PartKind.MOTOR, "resistance").orElseThrow();
        FieldResult ok = r.validate("4.7 mΩ");
        assertTrue(ok.ok());
        assertEquals(0.0047, ok.number());
        FieldResult bad = r.validate("-4.7 mOhm");
        assertFalse(bad.ok());
        assertEquals("must be greater than zero, got '-4.7 mOhm'", bad.message());
        assertEquals("expected ohms (Ω, Ohm), got '1 H' (an inductance)", r.validate("1 H").message());
    }

    @Test
    void listFieldsReadCommaSeparatedText() {
        FieldSpec f = PartFields.find(PartKind.BENCH, "pwm_frequencies").orElseThrow();
        assertEquals(List.of(20000.0, 40000.0), f.validate("20 kHz, 40kHz").numbers());
        assertTrue(f.validate("20 kHz, 0 Hz").message().contains("greater than zero"));
    }

    @Test
    void misspeltKeysGetTheClosestKey() {
        assertEquals("resistance", PartFields.suggest(PartKind.MOTOR, "resistence").orElseThrow());
        assertEquals("qgd", PartFields.suggest(PartKind.SWITCH, "Qgd").orElseThrow());
        assertTrue(PartFields.suggest(PartKind.MOTOR, "colour").isEmpty());
    }

    /** Levenshtein's classic example: kitten → sitting needs 3 edits. */
    @Test
    void editDistanceMatchesTheTextbookExample() {
        assertEquals(3, EditDistance.between("kitten", "sitting"));
        assertEquals(0, EditDistance.between("", ""));
        assertEquals(4, EditDistance.between("", "abcd"));
    }

    @Test
    void requiredFieldsHaveNoDefaultAndOptionalOnesSayTheirs() {
        for (PartKind kind : PartKind.values()) {
            for (FieldSpec f : PartFields.of(kind)) {
                if (f.required()) {
                    assertEquals("", f.defaultText(), f.key());
                    assertEquals(null, f.defaultValue(), f.key());
                }
            }
        }
        assertEquals("20 degC", PartFields.find(PartKind.MOTOR, "resistance_temp").orElseThrow().defaultText());
    }
}
