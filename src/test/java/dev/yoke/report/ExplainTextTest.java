package dev.yoke.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.engine.Constraint;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.TestEvaluators;
import org.junit.jupiter.api.Test;

class ExplainTextTest {

    @Test
    void explainFitsHundredColumnsMarksTheBindingMarginAndEndsWithTheCautions() {
        PairingResult r = TestEvaluators.small().explain(5, 1, 0, 1);
        String text = ExplainText.render(r);
        for (String line : text.split("\n")) {
            assertTrue(line.length() <= 100, line);
        }
        for (Constraint c : Constraint.values()) {
            assertTrue(text.contains(c.title()), c.title());
        }
        assertTrue(text.lines().anyMatch(l -> l.startsWith(">") && l.contains(r.binding().key())), "binding marked");
        assertTrue(text.contains(r.feasible() ? "FEASIBLE" : "NOT FEASIBLE"));
        assertTrue(text.contains("licensed"));
        for (var s : r.segments()) {
            assertTrue(text.contains(s.label()));
        }
    }
}
