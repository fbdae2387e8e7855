package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.engine.Metric;
import java.util.Arrays;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Sorting and filtering of the view, checked against the definitions (a sorted order; a filter keeps exactly the rows that pass). */
class ViewOrderTest {

    private final Fixtures.SyntheticTable table = new Fixtures.SyntheticTable(6, 5, 3, 2, 180);
    private final ShortlistContext context = new ShortlistContext(Fixtures.catalog(6, 5), Fixtures.scenario(), Set.of());

    @Test
    void everyRowAppearsOnceWithoutFilters() {
        int[] order = ViewOrder.compute(table, context, ViewSettings.DEFAULT);
        int[] sorted = order.clone();
        Arrays.sort(sorted);
        for (int i = 0; i < sorted.length; i++) {
            assertEquals(i, sorted[i], "a permutation of the rows");
        }
    }

    @Test
    void ascendingAndDescendingAreMonotonic() {
        ViewSettings ascending = ViewSettings.DEFAULT.sortedBy(ShortlistColumn.COST);
        int[] up = ViewOrder.compute(table, context, ascending);
        int[] down = ViewOrder.compute(table, context, ascending.sortedBy(ShortlistColumn.COST));
        for (int i = 1; i < up.length; i++) {
            assertTrue(table.value(up[i - 1], Metric.COST) <= table.value(up[i], Metric.COST));
            assertTrue(table.value(down[i - 1], Metric.COST) >= table.value(down[i], Metric.COST));
        }
    }

    @Test
    void sortIsStableSoTableOrderBreaksTies() {
        // Motor index is the slowest-varying index of the table, so within a motor rows must keep ascending order.
        int[] order = ViewOrder.compute(table, context, ViewSettings.DEFAULT.sortedBy(ShortlistColumn.MOTOR));
        for (int i = 1; i < order.length; i++) {
            assertTrue(order[i - 1] < order[i], "stable: equal motor keys keep table order");
        }
    }

    @Test
    void notANumberSortsLastBothWays() {
        Fixtures.SyntheticTable t = new Fixtures.SyntheticTable(6, 5, 3, 2, 180);
        t.values[Metric.COST.ordinal()][7] = Double.NaN;
        ViewSettings up = ViewSettings.DEFAULT.sortedBy(ShortlistColumn.COST);
        int[] a = ViewOrder.compute(t, context, up);
        int[] b = ViewOrder.compute(t, context, up.sortedBy(ShortlistColumn.COST));
        assertEquals(7, a[a.length - 1]);
        assertEquals(7, b[b.length - 1]);
    }

    @Test
    void filtersKeepExactlyThePassingRows() {
        ViewSettings v = ViewSettings.DEFAULT.withFeasibleOnly(true).withParetoOnly(false)
                .withThreshold(ShortlistColumn.MARGIN_RIPPLE, 0.3);
        int[] order = ViewOrder.compute(table, context, v);
        int expected = 0;
        for (int r = 0; r < table.size(); r++) {
            if (table.value(r, Metric.FEASIBLE) >= 0.5 && table.value(r, Metric.MARGIN_RIPPLE) >= 0.3) {
                expected++;
            }
        }
        assertEquals(expected, order.length);
    }

    @Test
    void textFilterMatchesLabelsIgnoringCase() {
        // Motor 2's label is "test motor C": searching the label finds its rows only.
        int[] order = ViewOrder.compute(table, context, ViewSettings.DEFAULT.withText("MOTOR c"));
        assertEquals(5 * 3 * 2, order.length);
        for (int row : order) {
            assertEquals(2, table.motorIndex(row));
        }
    }

    @Test
    void secondKeyIsDroppedWhenItBecomesFirst() {
        ViewSettings v = ViewSettings.DEFAULT.sortedBy(ShortlistColumn.MOTOR).thenSortedBy(ShortlistColumn.COST)
                .sortedBy(ShortlistColumn.COST);
        assertEquals(1, v.sort().size());
        assertArrayEquals(ViewOrder.compute(table, context, ViewSettings.DEFAULT.sortedBy(ShortlistColumn.COST)),
                ViewOrder.compute(table, context, v));
    }
}
