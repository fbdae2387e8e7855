package dev.yoke.tui;

/**
 * One column of a {@link GridComponent}.
 *
 * @param title     heading (short: the grid is read at 80 columns)
 * @param width     cells, heading included
 * @param alignRight numbers align right, words left
 */
public record GridColumn(String title, int width, boolean alignRight) {

    public GridColumn {
        if (width < 1) {
            throw new IllegalArgumentException("column width must be at least 1, got " + width);
        }
    }
}
