package dev.yoke.tui;

import dev.yoke.engine.Constraint;
import dev.yoke.engine.Ranking;
import dev.yoke.engine.Shortlist;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/** The shortlist as a {@link GridModel}: one grid row per pairing of the view order. */
public final class ShortlistGridModel implements GridModel {

    private static final ShortlistColumn[] COLUMNS = ShortlistColumn.values();
    private static final int FROZEN = 3;

    private final Shortlist shortlist;
    private final ViewSettings view;
    private final int[] order;
    private final Glyphs glyphs;
    private final Set<String> suspects;
    private final List<GridColumn> columns;

    /** Sorts and filters {@code shortlist} by {@code view} (through the engine's ranking). */
    public static ShortlistGridModel of(Shortlist shortlist, ViewSettings view, Glyphs glyphs, Set<String> suspects) {
        int[] order = shortlist == null ? new int[0] : Ranking.view(shortlist, view.sort(), view.filter());
        return new ShortlistGridModel(shortlist, view, order, glyphs, suspects);
    }

    private ShortlistGridModel(Shortlist shortlist, ViewSettings view, int[] order, Glyphs glyphs, Set<String> suspects) {
        this.shortlist = shortlist;
        this.view = view;
        this.order = order;
        this.glyphs = glyphs;
        this.suspects = Set.copyOf(suspects);
        int motorWidth = 5;
        int switchWidth = 6;
        if (shortlist != null) {
            for (Motor m : shortlist.evaluator().catalog().motors()) {
                motorWidth = Math.max(motorWidth, m.id().length() + (suspects.contains(m.id()) ? 1 : 0));
            }
            for (PowerSwitch s : shortlist.evaluator().catalog().switches()) {
                switchWidth = Math.max(switchWidth, s.id().length() + (suspects.contains(s.id()) ? 1 : 0));
            }
        }
        int bindingWidth = 7;
        for (Constraint c : Constraint.values()) {
            bindingWidth = Math.max(bindingWidth, c.key().length());
        }
        List<GridColumn> cols = new ArrayList<>();
        for (ShortlistColumn c : COLUMNS) {
            int width = switch (c) {
                case MOTOR -> Math.min(motorWidth, 18);
                case SWITCH -> Math.min(switchWidth, 18);
                case BINDING -> bindingWidth;
                default -> c.width();
            };
            // Room for a sort mark after the title (" v" or " v2").
            if (c != ShortlistColumn.FRONT) {
                width = Math.max(width, c.title().length() + 3);
            }
            cols.add(new GridColumn(c.heading(glyphs), width, c.alignRight()));
        }
        this.columns = List.copyOf(cols);
    }

    /** The shortlist column at a grid column index. */
    public static ShortlistColumn columnAt(int index) {
        return COLUMNS[index];
    }

    /** The grid column index of a shortlist column. */
    public static int indexOf(ShortlistColumn column) {
        return column.ordinal();
    }

    /** Shortlist row shown at a grid row. */
    public int shortlistRow(int gridRow) {
        return order[gridRow];
    }

    /** The grid row showing a shortlist row, or -1 when the view hides it. */
    public int gridRowOf(int shortlistRow) {
        for (int i = 0; i < order.length; i++) {
            if (order[i] == shortlistRow) {
                return i;
            }
        }
        return -1;
    }

    /** The view order (shortlist rows) behind this grid: what the export writes. */
    public int[] order() {
        return order.clone();
    }

    /** The ranked pairings, or null before the first ranking finishes. */
    public Shortlist shortlist() {
        return shortlist;
    }

    public ViewSettings view() {
        return view;
    }

    @Override
    public int rowCount() {
        return order.length;
    }

    @Override
    public List<GridColumn> columns() {
        return columns;
    }

    @Override
    public int frozenColumns() {
        return FROZEN;
    }

    @Override
    public String cell(int row, int column) {
        return COLUMNS[column].cell(shortlist, order[row], suspects, glyphs);
    }

    @Override
    public Tone tone(int row, int column) {
        return COLUMNS[column].tone(shortlist, order[row], suspects);
    }

    @Override
    public String headerMark(int column) {
        int position = view.sortPosition(COLUMNS[column]);
        if (position < 0) {
            return "";
        }
        char arrow = view.sort().get(position).descending() ? glyphs.descending() : glyphs.ascending();
        return position == 0 ? " " + arrow : " " + arrow + (position + 1);
    }
}
