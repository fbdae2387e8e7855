package dev.yoke.tui.edit;

import com.googlecode.lanterna.gui2.BasicWindow;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.catalog.PartKind;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FieldFormTest {

    private static FieldForm resistorForm() {
        return new FieldForm(List.of(
                FormField.of(PartKind.MOTOR, "resistance"),
                FormField.of(PartKind.MOTOR, "continuous_current"),
                FormField.of(PartKind.MOTOR, "peak_current")),
                List.of(FormRule.notBelow("peak_current", "continuous_current")), 10);
    }

    private static TerminalDriver show(FieldForm form) {
        TerminalDriver t = new TerminalDriver(100, 12);
        BasicWindow w = new BasicWindow("form");
        w.setComponent(form);
        t.gui.addWindow(w);
        t.update();
        return t;
    }

    @Test
    void wrongUnitIsNamedBesideTheFieldWhileTyping() throws Exception {
        FieldForm form = resistorForm().setValue("resistance", 1.0).setValue("continuous_current", 4.0)
                .setValue("peak_current", 20.0);
        try (TerminalDriver t = show(form)) {
            t.clearField(10).type("4.7 mH");
            String line = t.lineWithNext("resistance");
            assertTrue(line.contains("! expected ohms"), line);
            assertTrue(line.contains("4.7 mH"), line);
            assertTrue(form.values().isEmpty(), "an invalid form gives no values");
            assertEquals("expected ohms (Ω, Ohm), got '4.7 mH' (an inductance)", form.problems().get("resistance"));
        }
    }

    @Test
    void correctingTheFieldClearsItsMessageAtTheNextKey() throws Exception {
        FieldForm form = resistorForm().setValue("resistance", 1.0).setValue("continuous_current", 4.0)
                .setValue("peak_current", 20.0);
        try (TerminalDriver t = show(form)) {
            t.clearField(10).type("4.7 mH");
            assertFalse(form.problems().isEmpty());
            t.press(KeyType.Backspace).type("Ohm");
            assertTrue(form.problems().isEmpty(), form.problems().toString());
            assertEquals(0.0047, (Double) form.values().orElseThrow().get("resistance"), 1e-15);
            assertFalse(t.text().contains("!"), "no mark left once valid");
        }
    }

    @Test
    void crossFieldRuleNamesTheOtherField() throws Exception {
        FieldForm form = resistorForm().setValue("resistance", 1.0).setValue("continuous_current", 4.0)
                .setValue("peak_current", 20.0);
        try (TerminalDriver t = show(form)) {
            t.press(KeyType.ArrowDown, 2).clearField(10).type("3 A");
            assertEquals("must be ≥ continuous_current", form.problems().get("peak_current"));
            assertTrue(t.text().contains("! must be ≥ continuous_current"));
        }
    }

    @Test
    void untouchedValuesComeBackExactly() {
        // Values that have no short decimal form must survive being shown and read back unchanged.
        double awkward = 1.0 / 3.0;
        FieldForm form = resistorForm().setValue("resistance", awkward).setValue("continuous_current", 0.1 + 0.2)
                .setValue("peak_current", 7e-1);
        Map<String, Object> values = form.values().orElseThrow();
        assertAll(
                () -> assertEquals(awkward, (Double) values.get("resistance"), 0.0),
                () -> assertEquals(0.1 + 0.2, (Double) values.get("continuous_current"), 0.0),
                () -> assertEquals(0.7, (Double) values.get("peak_current"), 0.0));
    }

    @Test
    void commitFiresOnlyWhenLeavingAChangedField() throws Exception {
        FieldForm form = resistorForm().setValue("resistance", 1.0).setValue("continuous_current", 4.0)
                .setValue("peak_current", 20.0);
        List<String> commits = new ArrayList<>();
        form.onCommit(f -> commits.add(f.text("resistance")));
        try (TerminalDriver t = show(form)) {
            t.press(KeyType.ArrowDown).press(KeyType.ArrowUp);
            assertTrue(commits.isEmpty(), "moving without typing commits nothing");
            t.clearField(10).type("2 Ohm");
            assertTrue(commits.isEmpty(), "typing alone commits nothing");
            t.press(KeyType.Enter);
            assertEquals(List.of("2 Ohm"), commits);
        }
    }

    @Test
    void listFieldReadsCommaSeparatedQuantities() {
        FormField frequencies = FormField.of(PartKind.BENCH, "pwm_frequencies");
        assertEquals(List.of(16000.0, 20000.0, 40000.0), frequencies.read("16 kHz, 20 kHz, 40kHz"));
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> frequencies.read("16 kHz, 20 kV"));
        assertTrue(e.getMessage().startsWith("expected hertz"), e.getMessage());
        assertTrue(e.getMessage().contains("20 kV"), e.getMessage());
    }
}
