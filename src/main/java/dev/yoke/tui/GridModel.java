package dev.yoke.tui;

import java.util.List;

/**
 * What a {@link GridComponent} shows: a number of rows, columns and the text of each cell.
 * The grid asks only for the cells it draws, so a model may hold millions of rows.
 */
public interface GridModel {

    /** Rows currently shown (after filters). */
    int rowCount();

    /** All columns, frozen ones first. */
    List<GridColumn> columns();

    /** How many leading columns stay in place while the rest scroll sideways. */
    int frozenColumns();

    /** The text of one cell; the grid pads or cuts it to the column width. */
    String cell(int row, int column);

    /** The role of one cell's text, for colour; the text itself must already carry the meaning. */
    default Tone tone(int row, int column) {
        return Tone.NORMAL;
    }

    /** A mark drawn after a column's title (e.g. sort direction), or "" for none. */
    default String headerMark(int column) {
        return "";
    }
}
