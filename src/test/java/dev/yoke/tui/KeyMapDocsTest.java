package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** docs/keys.md says what the key map does: help, footers and documentation agree. */
class KeyMapDocsTest {

    @Test
    void keysPageMatchesTheKeyMap() throws Exception {
        String page = Files.readString(Path.of("docs/keys.md"));
        assertEquals(ScreenCaptures.KEYS_HEADING + KeyMap.markdown(), page,
                "docs/keys.md is out of date: regenerate it with ScreenCaptures (see docs/screens.md)");
    }
}
