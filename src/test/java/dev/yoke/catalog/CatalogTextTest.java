package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.yoke.catalog.CatalogText.FieldValue;
import java.io.IOException;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class CatalogTextTest {

    private static final String FILE = String.join("\n",
            "# Invented motors for tests.",
            "# Second header line.",
            "motors:",
            "  # the small one",
            "  - id: m1",
            "    label: small   # keep this comment",
            "    resistance: &r 1.2 ohm",
            "    inductance: 0.5 mH",
            "",
            "  - id: m2",
            "    resistance: *r",
            "    inductance: 1 mH",
            "switches: []",
            "");

    @Test
    void changedValueIsReplacedOnItsOwnLineAndCommentsStay() throws IOException {
        String edited = CatalogText.parse(FILE).withFields("motors", "m1",
                List.of(FieldValue.of("inductance", "0.75 mH"), FieldValue.of("label", "tiny")));
        assertEquals(FILE.replace("0.5 mH", "0.75 mH").replace("label: small ", "label: tiny "), edited);
    }

    @Test
    void anchorBeforeAValueIsKept() throws IOException {
        String edited = CatalogText.parse(FILE).withFields("motors", "m1",
                List.of(FieldValue.of("resistance", "1.5 ohm")));
        assertTrue(edited.contains("resistance: &r 1.5 ohm"), edited);
        // Read with SnakeYAML, which resolves aliases to scalars (YAML 1.1 spec, section 3.2.2.2).
        java.util.Map<String, List<java.util.Map<String, Object>>> tree = new org.yaml.snakeyaml.Yaml().load(edited);
        assertEquals("1.5 ohm", tree.get("motors").get(1).get("resistance"), "the alias follows its anchor");
    }

    @Test
    void aliasIsReplacedNotItsAnchor() throws IOException {
        String edited = CatalogText.parse(FILE).withFields("motors", "m2",
                List.of(FieldValue.of("resistance", "2 ohm")));
        assertEquals(FILE.replace("resistance: *r", "resistance: 2 ohm"), edited);
    }

    @Test
    void missingFieldIsAddedAtTheEndOfThePart() throws IOException {
        String edited = CatalogText.parse(FILE).withFields("motors", "m2",
                List.of(FieldValue.of("brush_drop", "0.3 V")));
        assertEquals(FILE.replace("    inductance: 1 mH\n", "    inductance: 1 mH\n    brush_drop: 0.3 V\n"), edited);
    }

    @Test
    void aliasKeyIsRewrittenToTheKeyGiven() throws IOException {
        String text = "motors:\n  - id: a\n    back_emf_constant: 0.02 V*s/rad  # measured\n";
        String edited = CatalogText.parse(text).withFields("motors", "a",
                List.of(new FieldValue("torque_constant", List.of("torque_constant", "back_emf_constant"), "0.03 N*m/A")));
        assertEquals("motors:\n  - id: a\n    torque_constant: 0.03 N*m/A  # measured\n", edited);
    }

    @Test
    void deletedPartLosesItsLinesOnly() throws IOException {
        String edited = CatalogText.parse(FILE).withoutItem("motors", "m1");
        assertEquals(FILE.replace("  - id: m1\n    label: small   # keep this comment\n"
                + "    resistance: &r 1.2 ohm\n    inductance: 0.5 mH\n", ""), edited);
    }

    @Test
    void listLeftEmptyReadsAsEmptyList() throws IOException {
        String text = "motors:  # all of them\n  - id: a\n    label: x\nswitches: []\n";
        String edited = CatalogText.parse(text).withoutItem("motors", "a");
        assertEquals("motors: []  # all of them\nswitches: []\n", edited);
        assertTrue(yaml(edited).get("motors").isArray());
    }

    @Test
    void newPartIsAppendedAfterTheLastOfItsListWithItsIndent() throws IOException {
        String edited = CatalogText.parse(FILE).withItemAppended("motors",
                List.of(FieldValue.of("id", "m3"), FieldValue.of("inductance", "2 mH")));
        assertEquals(FILE.replace("    inductance: 1 mH\n", "    inductance: 1 mH\n  - id: m3\n    inductance: 2 mH\n"),
                edited);
    }

    @Test
    void newPartReplacesAnEmptyFlowList() throws IOException {
        String edited = CatalogText.parse(FILE).withItemAppended("switches",
                List.of(FieldValue.of("id", "s1"), FieldValue.of("label", "x")));
        assertTrue(edited.endsWith("switches:\n  - id: s1\n    label: x\n"), edited);
        assertEquals("s1", yaml(edited).at("/switches/0/id").asText());
    }

    @Test
    void missingListIsCreatedAtTheEnd() throws IOException {
        String edited = CatalogText.parse("motors: []\n").withItemAppended("switches",
                List.of(FieldValue.of("id", "s1")));
        assertEquals("motors: []\nswitches:\n  - id: s1\n", edited);
    }

    @Test
    void windowsLineEndingsAreKept() throws IOException {
        String text = "motors:\r\n  - id: a\r\n    label: x\r\n";
        String edited = CatalogText.parse(text).withFields("motors", "a", List.of(FieldValue.of("mass", "1 kg")));
        assertEquals("motors:\r\n  - id: a\r\n    label: x\r\n    mass: 1 kg\r\n", edited);
    }

    @Test
    void textBeyondTheBasicPlaneKeepsPositions() throws IOException {
        String text = "# 🔧 tools\nmotors:\n  - id: a\n    label: 🔧 wrench\n    mass: 1 kg\n";
        String edited = CatalogText.parse(text).withFields("motors", "a", List.of(FieldValue.of("mass", "2 kg")));
        assertEquals(text.replace("1 kg", "2 kg"), edited);
    }

    @Test
    void flowStyleListIsRefusedWithAMessage() throws IOException {
        CatalogText text = CatalogText.parse("motors: [{id: a}, {id: b}]\n");
        IOException e = assertThrows(IOException.class, () -> text.withoutItem("motors", "a"));
        assertTrue(e.getMessage().contains("flow style"), e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(strings = {"plain words", "", " padded ", "a: b", "x #y", "-dash", "yes", "NO", "null", "12",
            "1.5e3", "0x1f", "line\nbreak", "quote\"back\\slash", "tab\there", "*star", "&amp", "!bang", "%", "@",
            "'single'", "ünïcödé", "🔧", ".inf", "~", "key:"})
    void scalarReadsBackAsTheSameText(String raw) throws IOException {
        JsonNode node = yaml("value: " + CatalogText.scalar(raw) + "\n").get("value");
        assertTrue(node.isTextual(), "read back as text: " + CatalogText.scalar(raw));
        assertEquals(raw, node.asText());
    }

    private static JsonNode yaml(String text) throws IOException {
        return new ObjectMapper(new YAMLFactory()).readTree(text);
    }
}
