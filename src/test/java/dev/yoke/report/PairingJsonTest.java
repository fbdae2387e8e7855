package dev.yoke.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.TestEvaluators;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class PairingJsonTest {

    private static final PairingResult RESULT = TestEvaluators.small().explain(3, 2, 1, 0);

    /** The field names per table of docs/json-report.md, keyed by the section heading. */
    private static Map<String, List<String>> documentedFields() throws Exception {
        Map<String, List<String>> sections = new LinkedHashMap<>();
        String section = null;
        Pattern row = Pattern.compile("^\\| `([a-z_]+)` \\|");
        for (String line : Files.readAllLines(Path.of("docs/json-report.md"))) {
            if (line.startsWith("## ")) {
                section = line.substring(3).replace("`", "").trim();
                sections.put(section, new ArrayList<>());
            }
            Matcher m = row.matcher(line);
            if (section != null && m.find()) {
                sections.get(section).add(m.group(1));
            }
        }
        return sections;
    }

    private static List<String> names(JsonNode n) {
        List<String> out = new ArrayList<>();
        for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
            out.add(it.next());
        }
        return out;
    }

    @Test
    void explainObjectHasExactlyTheDocumentedFields() throws Exception {
        Map<String, List<String>> doc = documentedFields();
        JsonNode o = PairingJson.of(RESULT, true, null);
        List<String> top = new ArrayList<>(doc.get("Pairing object"));
        top.remove("pareto"); // rank only
        assertEquals(top, names(o));
        assertEquals(doc.get("totals"), names(o.get("totals")));
        assertEquals(doc.get("segments[]"), names(o.get("segments").get(0)));
        assertEquals(doc.get("switch_losses[]"), names(o.get("segments").get(0).get("switch_losses").get(0)));
        assertEquals(4, o.get("segments").get(0).get("switch_losses").size());
    }

    @Test
    void rankObjectsCarryTheParetoFlagAndLeaveSegmentsOut() {
        JsonNode o = PairingJson.of(RESULT, false, Boolean.TRUE);
        assertTrue(o.get("pareto").asBoolean());
        assertFalse(o.has("segments"));
    }

    @Test
    void everyMarginIsListedByItsKeyAndTheBindingOneIsTheSmallest() {
        JsonNode o = PairingJson.of(RESULT, false, null);
        double least = Double.POSITIVE_INFINITY;
        String leastKey = null;
        for (Constraint c : Constraint.values()) {
            double m = o.get("margins").get(c.key()).asDouble();
            if (m < least) {
                least = m;
                leastKey = c.key();
            }
        }
        assertEquals(leastKey, o.get("binding").asText());
        assertEquals(least, o.get("binding_margin").asDouble(), 0.0);
        assertEquals(RESULT.feasible(), o.get("feasible").asBoolean());
    }

    @Test
    void totalLossIsTheSumOfItsParts() {
        JsonNode t = PairingJson.of(RESULT, false, null).get("totals");
        // conservation: total = bridge + motor + gate drive (Metric.TOTAL_LOSS definition)
        assertEquals(t.get("bridge_loss").asDouble() + t.get("motor_loss").asDouble() + t.get("gate_drive_loss").asDouble(),
                t.get("total_loss").asDouble(), 1e-12);
    }
}
