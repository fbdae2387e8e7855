package dev.yoke.report;

import dev.yoke.engine.Metric;
import dev.yoke.engine.Shortlist;
import dev.yoke.units.Dimension;

/**
 * The ranked pairings as a text table that fits 100 columns: identity, verdict, total loss, cost,
 * RMS current, hottest junction and winding, and the binding constraint with its margin. Units
 * sit in the headers, cells carry engineering prefixes ({@code 850 m} under {@code Irms[A]} is
 * 850 mA). A {@code *} after the rank marks the cost–loss front.
 */
public final class ShortlistTable {

    /** Widest line the table is allowed (a common terminal width). */
    public static final int WIDTH = 100;

    private ShortlistTable() {
    }

    /** The first {@code limit} rows of {@code order}, then a legend line. */
    public static String render(Shortlist s, int[] order, int limit) {
        TextTable t = new TextTable()
                .right("#")
                .column("motor", false, 0)
                .column("switch", false, 0)
                .right("PWM[Hz]")
                .right("ratio")
                .left("ok")
                .right("loss[W]")
                .right("cost")
                .right("Irms[A]")
                .right("Tj[°C]")
                .right("Tw[°C]")
                .left("binding margin");
        int n = Math.min(limit, order.length);
        for (int i = 0; i < n; i++) {
            int r = order[i];
            t.row((i + 1) + (s.isPareto(r) ? "*" : " "),
                    s.motorId(r),
                    s.switchId(r),
                    Cells.bare(s.frequency(r), Dimension.FREQUENCY),
                    Cells.ratio(s.ratio(r)),
                    s.feasible(r) ? "yes" : "no",
                    Cells.bare(s.value(r, Metric.TOTAL_LOSS), Dimension.POWER),
                    Cells.bare(s.value(r, Metric.COST), Dimension.PRICE),
                    Cells.bare(s.value(r, Metric.CURRENT_RMS), Dimension.CURRENT),
                    Cells.bare(s.value(r, Metric.JUNCTION_TEMP_MAX), Dimension.TEMPERATURE),
                    Cells.bare(s.value(r, Metric.WINDING_TEMP_MAX), Dimension.TEMPERATURE),
                    s.binding(r).key() + " " + Cells.percent(s.bindingMargin(r)));
        }
        fit(t, WIDTH, 1, 2);
        return t.render() + "* on the cost-loss front of feasible pairings; margins: (limit - value)/limit, negative fails\n";
    }

    /** Shrinks the given text columns, widest first, until the table fits {@code width}. */
    static void fit(TextTable t, int width, int... shrinkable) {
        int[] caps = new int[t.columns()];
        for (int c : shrinkable) {
            caps[c] = t.naturalWidth(c);
        }
        while (t.width() > width) {
            int widest = -1;
            for (int c : shrinkable) {
                if (caps[c] > 6 && (widest < 0 || caps[c] > caps[widest])) {
                    widest = c;
                }
            }
            if (widest < 0) {
                return;
            }
            caps[widest]--;
            t.cap(widest, caps[widest]);
        }
    }
}
