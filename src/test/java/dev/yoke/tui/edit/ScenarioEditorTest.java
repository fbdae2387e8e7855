package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.model.Scenario;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ScenarioEditorTest {

    @Test
    void screenShows() throws Exception {
        List<Scenario> passed = new ArrayList<>();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor.open(t.gui, DemoScenario.conveyor(), Path.of("demo.yaml"), passed::add);
            System.out.println(t.text());
            t.press(KeyType.ArrowDown).clearField(4).type("4.7 mH");
            System.out.println(t.text());
            t.press(KeyType.Tab);
            System.out.println(t.text());
        }
    }
}
