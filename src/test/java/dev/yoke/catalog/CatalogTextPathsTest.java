package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.yoke.catalog.CatalogText.FieldValue;
import dev.yoke.catalog.CatalogText.ListEntry;
import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Text edits addressed by path: sections, items of nested lists, and rearranged lists. */
class CatalogTextPathsTest {

    private static final String PROFILE = "profile:\n"
            + "  load_inertia: 1 kg*m^2   # the arm\n"
            + "  segments:\n"
            + "    # the cycle\n"
            + "    - label: a\n"
            + "      duration: 1 s\n"
            + "    # b comes back\n"
            + "    - label: b   # second\n"
            + "      duration: 2 s";

    @Test
    void rearrangedItemsMoveWithTheirCommentsEvenWithoutAFinalNewline() throws IOException {
        String edited = CatalogText.parse(PROFILE).withItemsArranged(List.of("profile", "segments"),
                List.of(ListEntry.kept(1), ListEntry.kept(0),
                        ListEntry.added(List.of(FieldValue.of("label", "c"), FieldValue.of("duration", "3 s")))));
        assertEquals("profile:\n"
                + "  load_inertia: 1 kg*m^2   # the arm\n"
                + "  segments:\n"
                + "    # the cycle\n"
                + "    # b comes back\n"
                + "    - label: b   # second\n"
                + "      duration: 2 s\n"
                + "    - label: a\n"
                + "      duration: 1 s\n"
                + "    - label: c\n"
                + "      duration: 3 s\n", edited);
    }

    @Test
    void missingKeyGoesAfterTheKeyBeforeItInTheOrderOrFirst() throws IOException {
        CatalogText text = CatalogText.parse(PROFILE + "\n");
        List<String> order = List.of("label", "duration", "speed_start", "speed_end", "torque");
        String edited = text.withItemFields(List.of("profile", "segments"), 0,
                List.of(FieldValue.of("speed_end", "2 rad/s"), FieldValue.of("duration", "4 s")), order);
        assertEquals(PROFILE.replace("      duration: 1 s\n", "      duration: 4 s\n      speed_end: 2 rad/s\n")
                + "\n", edited);
        String repeat = text.withSectionFields(List.of("profile"), List.of(FieldValue.of("repeat", "false")),
                List.of("load_inertia", "repeat", "segments"));
        assertEquals(PROFILE.replace("# the arm\n", "# the arm\n  repeat: false\n") + "\n", repeat);
        String first = CatalogText.parse("profile:\n  segments:\n    - duration: 1 s\n").withItemFields(
                List.of("profile", "segments"), 0, List.of(FieldValue.of("label", "x")), order);
        assertEquals("profile:\n  segments:\n    - label: x\n      duration: 1 s\n", first);
    }

    @Test
    void keyWithNothingAfterItCountsAsAbsentAndIsFilledInPlace() throws IOException {
        CatalogText text = CatalogText.parse("profile:\n  segments:\n    - duration: 1 s\n      speed_end:\n");
        assertEquals(List.of("duration"), text.keysOfItem(List.of("profile", "segments"), 0));
        assertEquals("profile:\n  segments:\n    - duration: 1 s\n      speed_end: 0 rad/s\n",
                text.withItemFields(List.of("profile", "segments"), 0, List.of(FieldValue.of("speed_end", "0 rad/s")),
                        List.of()));
    }

    @Test
    void pathsThatAreNotSectionsOrBlockListsAreRefused() throws IOException {
        CatalogText text = CatalogText.parse("profile:\n  segments: [{duration: 1 s}]\nname: x\n");
        assertThrows(IOException.class, () -> text.keysAt(List.of("name")));
        assertThrows(IOException.class, () -> text.keysAt(List.of("bench")));
        assertThrows(IOException.class, () -> text.withItemsArranged(List.of("profile", "segments"),
                List.of(ListEntry.kept(0))));
        assertThrows(IOException.class, () -> text.withItemFields(List.of("profile", "segments"), 0,
                List.of(FieldValue.of("duration", "2 s")), List.of()));
    }
}
