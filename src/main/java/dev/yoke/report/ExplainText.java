package dev.yoke.report;

import dev.yoke.engine.Advisory;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.SegmentResult;
import dev.yoke.engine.SwitchLoss;
import dev.yoke.engine.Totals;
import dev.yoke.units.Dimension;
import java.util.List;
import java.util.Locale;

/**
 * One pairing explained for a terminal, within 100 columns: the verdict and binding constraint,
 * each segment's operating point, the losses per switch and in the motor, temperatures, the
 * cycle totals, every margin (the binding one marked), the warnings and the cautions.
 */
public final class ExplainText {

    private ExplainText() {
    }

    public static String render(PairingResult r) {
        StringBuilder out = new StringBuilder();
        out.append("Motor  ").append(r.motor().id()).append(label(r.motor().label())).append('\n');
        out.append("Switch ").append(r.powerSwitch().id()).append(label(r.powerSwitch().label()))
                .append(" (four in the bridge)\n");
        out.append("PWM ").append(Cells.full(r.pwmFrequency(), Dimension.FREQUENCY))
                .append(", gear ratio ").append(Cells.ratio(r.gearRatio())).append('\n');
        out.append(r.feasible() ? "FEASIBLE" : "NOT FEASIBLE").append(": binding constraint ")
                .append(r.binding().title()).append(" (").append(r.binding().key()).append("), margin ")
                .append(Cells.percent(r.bindingMargin())).append('\n');

        out.append("\nOperating points (each segment at its fastest, hardest point)\n");
        TextTable ops = new TextTable(" ")
                .left("segment").right("time").right("speed").right("torque").right("I avg")
                .right("V term").right("duty").right("ripple").right("I rms").right("I peak");
        for (SegmentResult s : r.segments()) {
            ops.row(s.label(), Cells.full(s.duration(), Dimension.TIME), Cells.full(s.motorSpeed(), Dimension.ANGULAR_SPEED),
                    Cells.full(s.motorTorque(), Dimension.TORQUE), Cells.full(s.currentAvg(), Dimension.CURRENT),
                    Cells.full(s.terminalVoltage(), Dimension.VOLTAGE), String.format(Locale.ROOT, "%.1f%%", s.duty() * 100),
                    Cells.full(s.currentRipplePp(), Dimension.CURRENT), Cells.full(s.currentRms(), Dimension.CURRENT),
                    Cells.full(s.currentPeak(), Dimension.CURRENT));
        }
        ShortlistTable.fit(ops, ShortlistTable.WIDTH, 0);
        out.append(ops.render());

        out.append("\nLosses per segment [W] (switch positions: H/L = high/low side of legs A and B) and temperatures\n");
        List<SegmentResult> segs = r.segments();
        String[] positions = segs.isEmpty() ? new String[] {"HA", "LA", "HB", "LB"}
                : segs.get(0).switchLosses().stream().map(SwitchLoss::position).toArray(String[]::new);
        TextTable loss = new TextTable(" ").left("segment");
        for (String p : positions) {
            loss.right(p);
        }
        loss.right("motor").right("R wind").right("T wind").right("T wind pk").right("Tj max");
        for (SegmentResult s : segs) {
            String[] cells = new String[1 + positions.length + 5];
            int c = 0;
            cells[c++] = s.label();
            for (int i = 0; i < positions.length; i++) {
                cells[c++] = i < s.switchLosses().size() ? Cells.bare(s.switchLosses().get(i).total(), Dimension.POWER) : "";
            }
            cells[c++] = Cells.bare(s.motorLoss(), Dimension.POWER);
            cells[c++] = Cells.full(s.windingResistance(), Dimension.RESISTANCE);
            cells[c++] = Cells.full(s.windingTemp(), Dimension.TEMPERATURE);
            cells[c++] = Cells.full(s.windingTempPeak(), Dimension.TEMPERATURE);
            double tj = Double.NEGATIVE_INFINITY;
            for (double v : s.junctionTemps()) {
                tj = Math.max(tj, v);
            }
            cells[c] = Cells.full(tj, Dimension.TEMPERATURE);
            loss.row(cells);
        }
        ShortlistTable.fit(loss, ShortlistTable.WIDTH, 0);
        out.append(loss.render());

        Totals t = r.totals();
        out.append("\nOver the cycle\n");
        out.append(String.format(Locale.ROOT, "  current     %s rms, %s peak, largest ripple %s, largest duty %.1f%%%n",
                Cells.full(t.currentRms(), Dimension.CURRENT), Cells.full(t.currentPeak(), Dimension.CURRENT),
                Cells.full(t.ripplePeakToPeak(), Dimension.CURRENT), t.dutyMax() * 100));
        out.append(String.format(Locale.ROOT, "  losses      bridge %s, motor %s, gate drive %s, total %s%n",
                Cells.full(t.bridgeLoss(), Dimension.POWER), Cells.full(t.motorLoss(), Dimension.POWER),
                Cells.full(t.gateDriveLoss(), Dimension.POWER),
                Cells.full(t.bridgeLoss() + t.motorLoss() + t.gateDriveLoss(), Dimension.POWER)));
        out.append(String.format(Locale.ROOT, "  energy      %s in, %s out per cycle, efficiency %s%n",
                Cells.full(t.energyIn(), Dimension.ENERGY), Cells.full(t.energyOut(), Dimension.ENERGY),
                Double.isFinite(t.efficiency()) ? String.format(Locale.ROOT, "%.1f%%", t.efficiency() * 100) : "n/a"));
        out.append(String.format(Locale.ROOT, "  hottest     junction %s, winding %s%n",
                Cells.full(t.junctionTempMax(), Dimension.TEMPERATURE), Cells.full(t.windingTempMax(), Dimension.TEMPERATURE)));
        out.append(String.format(Locale.ROOT, "  parts       cost %s (motor + 4 switches), motor mass %s%n",
                Cells.full(t.cost(), Dimension.PRICE), Cells.full(t.mass(), Dimension.MASS)));

        out.append("\nMargins ((limit - value)/limit; negative fails; > marks the binding one)\n");
        TextTable margins = new TextTable(" ").left(" ").left("key").left("constraint").right("margin").left("");
        for (Constraint c : Constraint.values()) {
            Double m = r.margins().get(c);
            if (m == null) {
                continue;
            }
            margins.row(c == r.binding() ? ">" : " ", c.key(), c.title(), Cells.percent(m), m < 0 ? "FAILS" : "");
        }
        out.append(margins.render());

        out.append("\nWarnings\n");
        if (r.advisories().isEmpty()) {
            out.append("  none\n");
        }
        for (Advisory a : Advisory.values()) {
            if (r.advisories().contains(a)) {
                out.append("  - ").append(a.message()).append(" (").append(a.key()).append(")\n");
            }
        }
        out.append('\n').append(Cautions.FULL).append('\n');
        return out.toString();
    }

    private static String label(String label) {
        return label == null || label.isBlank() ? "" : "  " + label;
    }
}
