package dev.yoke.cli;

import static dev.yoke.cli.RankCommandTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Runs the harness on a tiny catalog to check it works; timings are not asserted. */
class BenchCommandTest {

    @Test
    void throughputPartRunsOnATinySyntheticCatalog() {
        RankCommandTest.Run r = run("bench", "--motors", "3", "--switches", "4", "--frequencies", "2", "--ratios", "2",
                "--seconds", "0.2", "--skip", "rerank,memory");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("3 motors x 4 switches x 2 frequencies x 2 ratios = 48 pairings"), r.out());
        assertTrue(r.out().contains("pairings per second"), r.out());
    }

    @Test
    void nonsenseCountsAreBadInput() {
        assertEquals(2, run("bench", "--motors", "0").status());
    }

    /** A misspelt part to skip is refused by name, not silently run (exit 2, the bad-input status). */
    @Test
    void unknownPartToSkipIsBadInputNamingTheParts() {
        RankCommandTest.Run r = run("bench", "--skip", "rerank,memry");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("unknown part 'memry'") && r.err().contains("throughput, rerank, memory"), r.err());
    }
}
