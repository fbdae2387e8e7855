package dev.yoke.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.engine.Ranking;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SortKey;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.TestEvaluators;
import java.util.List;
import org.junit.jupiter.api.Test;

class ShortlistTableTest {

    @Test
    void everyLineFitsHundredColumnsEvenWithLongIds() {
        String longId = "a-motor-id-that-goes-on-and-on-for-quite-a-while";
        Shortlist s = Sweep.all(TestEvaluators.withIds(List.of(longId, "M2"), List.of("Q1", longId + "-switch")));
        String text = ShortlistTable.render(s, Ranking.order(s, SortKey.DEFAULT), 20);
        for (String line : text.split("\n")) {
            assertTrue(line.length() <= 100, line.length() + ": " + line);
        }
    }

    @Test
    void headerCarriesUnitsAndEveryRowNamesItsBindingConstraintAndMargin() {
        Shortlist s = Sweep.all(TestEvaluators.small());
        int[] order = Ranking.order(s, SortKey.DEFAULT);
        String[] lines = ShortlistTable.render(s, order, 15).split("\n");
        assertTrue(lines[0].contains("loss[W]") && lines[0].contains("Irms[A]") && lines[0].contains("Tj[°C]"), lines[0]);
        assertEquals(1 + 15 + 1, lines.length, "header, 15 rows, legend");
        for (int i = 0; i < 15; i++) {
            String line = lines[i + 1];
            String expected = s.binding(order[i]).key() + " ";
            assertTrue(line.contains(expected) && line.matches(".*[+-]?[0-9.]+%$"), line);
            assertTrue(line.trim().startsWith((i + 1) + ""), line);
        }
    }

    @Test
    void percentagesKeepASignAndADecimalWhenSmall() {
        assertEquals("+12%", Cells.percent(0.12));
        assertEquals("-0.4%", Cells.percent(-0.004));
        assertEquals("0.0%", Cells.percent(-0.0001));
        assertEquals("<-999%", Cells.percent(-25));
    }
}
