package dev.yoke.tui;

import com.googlecode.lanterna.gui2.BasicWindow;
import com.googlecode.lanterna.gui2.BorderLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import java.util.List;
import java.util.function.IntFunction;

/** A full-screen page: a title line, a scrolling {@link TextPage} and a footer of the screen's keys. */
final class PageWindow extends BasicWindow {

    private final TextPage page;
    private final KeyMap.View view;

    PageWindow(String title, IntFunction<List<Line>> layout, KeyMap.View view, TerminalTraits traits) {
        super(title);
        this.view = view;
        setHints(List.of(Window.Hint.FULL_SCREEN, Window.Hint.NO_DECORATIONS));
        page = new TextPage(layout, traits);
        Panel panel = new Panel(new BorderLayout());
        panel.addComponent(new Bar(traits, Tone.BAR, w -> " " + title), BorderLayout.Location.TOP);
        panel.addComponent(page, BorderLayout.Location.CENTER);
        panel.addComponent(new Bar(traits, Tone.BAR, w -> " " + KeyMap.footer(view, w - 1)), BorderLayout.Location.BOTTOM);
        setComponent(panel);
        setFocusedInteractable(page);
    }

    TextPage page() {
        return page;
    }

    KeyMap.View view() {
        return view;
    }
}
