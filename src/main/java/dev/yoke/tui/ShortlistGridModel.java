package dev.yoke.tui;

import dev.yoke.engine.Constraint;
import java.util.ArrayList;
import java.util.List;

/** The shortlist as a {@link GridModel}: one grid row per pairing of the current view order. */
public final class ShortlistGridModel implements GridModel {

    private static final ShortlistColumn[] COLUMNS = ShortlistColumn.values();
    private static final int FROZEN = 3;

    private final PairingTable table;
    private final ShortlistContext context;
    private final ViewSettings view;
    private final int[] order;
    private final Glyphs glyphs;
    private final List<GridColumn> columns;

    public ShortlistGridModel(PairingTable table, ShortlistContext context, ViewSettings view, int[] order, Glyphs glyphs) {
        this.table = table;
        this.context = context;
        this.view = view;
        this.order = order;
        this.glyphs = glyphs;
        int motorWidth = 5;
        for (var m : context.catalog().motors()) {
            motorWidth = Math.max(motorWidth, m.id().length() + (context.isSuspect(m.id()) ? 1 : 0));
        }
        int switchWidth = 6;
        for (var s : context.catalog().switches()) {
            switchWidth = Math.max(switchWidth, s.id().length() + (context.isSuspect(s.id()) ? 1 : 0));
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
            String title = c == ShortlistColumn.FRONT ? String.valueOf(glyphs.paretoMark()) : c.title();
            cols.add(new GridColumn(title, width, c.alignRight()));
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

    /** Table row shown at a grid row. */
    public int tableRow(int gridRow) {
        return order[gridRow];
    }

    /** The grid row showing a table row, or -1 when the view hides it. */
    public int gridRowOf(int tableRow) {
        for (int i = 0; i < order.length; i++) {
            if (order[i] == tableRow) {
                return i;
            }
        }
        return -1;
    }

    /** The view order (table rows) behind this grid: what the export writes. */
    public int[] order() {
        return order.clone();
    }

    public PairingTable table() {
        return table;
    }

    public ShortlistContext context() {
        return context;
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
        return COLUMNS[column].cell(table, order[row], context, glyphs);
    }

    @Override
    public Tone tone(int row, int column) {
        return COLUMNS[column].tone(table, order[row], context);
    }

    @Override
    public String headerMark(int column) {
        List<SortKey> sort = view.sort();
        for (int i = 0; i < sort.size(); i++) {
            if (sort.get(i).column() == COLUMNS[column]) {
                char arrow = sort.get(i).descending() ? glyphs.descending() : glyphs.ascending();
                return i == 0 ? " " + arrow : " " + arrow + "2";
            }
        }
        return "";
    }
}
