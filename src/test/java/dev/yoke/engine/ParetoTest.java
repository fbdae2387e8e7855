package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class ParetoTest {

    @Test
    void frontMatchesTheBruteForceDefinition() {
        // sizes from a handful (many ties of cost and loss) to a few thousand rows
        int[][] shapes = {{1, 1, 1, 1}, {3, 4, 1, 1}, {7, 9, 2, 1}, {20, 30, 2, 3}, {41, 13, 1, 4}};
        for (int seed = 0; seed < 6; seed++) {
            for (int[] s : shapes) {
                Shortlist shortlist = Sweep.all(new FakeEvaluator(s[0], s[1], s[2], s[3], seed, 0.1 + 0.15 * seed));
                List<Reference.Row> rows = Reference.rows(shortlist);
                for (Reference.Row row : rows) {
                    assertEquals(Reference.onFrontBruteForce(rows, row), shortlist.isPareto(row.row()),
                            "row " + row.identity() + " seed " + seed);
                }
            }
        }
    }

    @Test
    void infeasiblePairingsAreNeverOnTheFront() {
        Shortlist s = Sweep.all(new FakeEvaluator(30, 30, 1, 1, 5, 0.3));
        int front = 0;
        for (int r = 0; r < s.size(); r++) {
            if (s.isPareto(r)) {
                assertTrue(s.feasible(r));
                front++;
            }
        }
        assertTrue(front > 0);
        assertEquals(front, s.paretoCount());
    }

    @Test
    void noFeasiblePairingMeansAnEmptyFront() {
        Shortlist s = Sweep.all(new FakeEvaluator(5, 5, 1, 1, 5, 0.0));
        assertEquals(0, s.paretoCount());
        assertFalse(s.feasible(0));
    }
}
