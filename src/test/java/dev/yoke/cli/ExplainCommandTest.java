package dev.yoke.cli;

import static dev.yoke.cli.RankCommandTest.DEMO;
import static dev.yoke.cli.RankCommandTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

class ExplainCommandTest {

    /** The best pairing of the demo by the default order, read from rank's JSON. */
    private static JsonNode best() throws Exception {
        RankCommandTest.Run r = run("rank", DEMO, "--top", "1", "--json", "-");
        return new ObjectMapper().readTree(r.out()).get(0);
    }

    @Test
    void jsonHasTheDocumentedTopLevelFieldsAndAgreesWithRank() throws Exception {
        JsonNode top = best();
        RankCommandTest.Run r = run("explain", DEMO, "--motor", top.get("motor").asText(), "--switch", top.get("switch").asText(),
                "--pwm", top.get("pwm_frequency").asText(), "--ratio", top.get("gear_ratio").asText(), "--json");
        assertEquals(0, r.status(), r.err());
        JsonNode o = new ObjectMapper().readTree(r.out());
        for (String field : new String[] {"motor", "switch", "pwm_frequency", "gear_ratio", "feasible", "binding", "warnings",
                "margins", "totals", "segments"}) {
            assertTrue(o.has(field), field);
        }
        for (String field : new String[] {"current_rms", "current_peak", "bridge_loss", "motor_loss", "gate_drive_loss",
                "efficiency", "energy_in", "energy_out", "junction_temp_max", "winding_temp_max", "cost", "mass"}) {
            assertTrue(o.get("totals").has(field), field);
        }
        // the same pairing through the fast path (rank) and the detailed path (explain)
        assertEquals(top.get("totals").get("bridge_loss").asDouble(), o.get("totals").get("bridge_loss").asDouble(), 1e-9);
        assertEquals(top.get("binding").asText(), o.get("binding").asText());
    }

    @Test
    void frequencyWithUnitsIsAcceptedAndNeedNotBeOnTheBench() throws Exception {
        JsonNode top = best();
        RankCommandTest.Run r = run("explain", DEMO, "--motor", top.get("motor").asText(), "--switch",
                top.get("switch").asText(), "--pwm", "33kHz", "--json");
        assertTrue(r.status() <= 1, r.err());
        assertEquals(33000.0, new ObjectMapper().readTree(r.out()).get("pwm_frequency").asDouble(), 0.0);
    }

    @Test
    void textNamesTheBindingConstraintAndTheCautions() throws Exception {
        JsonNode top = best();
        RankCommandTest.Run r = run("explain", DEMO, "--motor", top.get("motor").asText(), "--switch", top.get("switch").asText(),
                "--pwm", top.get("pwm_frequency").asText(), "--ratio", top.get("gear_ratio").asText());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith(">") && l.contains(top.get("binding").asText())), r.out());
        assertTrue(r.out().contains("licensed"));
        for (String line : r.out().split("\n")) {
            assertTrue(line.length() <= 100, line);
        }
    }

    @Test
    void unknownIdIsBadInputWithASuggestion() throws Exception {
        JsonNode top = best();
        String motor = top.get("motor").asText();
        String typo = motor.substring(0, motor.length() - 1);
        RankCommandTest.Run r = run("explain", DEMO, "--motor", typo, "--switch", top.get("switch").asText());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("'" + typo + "'") && r.err().contains("did you mean '" + motor + "'"), r.err());
    }

    @Test
    void badFrequencyIsBadInput() throws Exception {
        JsonNode top = best();
        RankCommandTest.Run r = run("explain", DEMO, "--motor", top.get("motor").asText(), "--switch",
                top.get("switch").asText(), "--pwm", "20 kV");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("--pwm"), r.err());
    }
}
