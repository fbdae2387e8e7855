package dev.yoke.tui;

import dev.yoke.engine.Advisory;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.SegmentResult;
import dev.yoke.engine.SwitchLoss;
import dev.yoke.engine.Totals;
import dev.yoke.model.Bench;
import dev.yoke.model.Scenario;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Lays out one pairing's whole evaluation for reading: verdict, every margin (the binding one
 * marked and in reverse video, not only coloured), cycle figures, the per-segment table, losses
 * per switch and mechanism and in the motor, temperatures, advisories, and text plots of current
 * and winding temperature over the cycle.
 */
public final class DetailReport {

    private static final double RPM_PER_RAD_S = 60.0 / (2 * Math.PI);

    private DetailReport() {
    }

    /** The report as lines for a screen of {@code width} columns. */
    public static List<Line> lines(PairingResult r, Scenario scenario, TerminalTraits traits, int width) {
        Glyphs g = traits.glyphs();
        String deg = traits.unicode() ? "\u00B0C" : "C";
        List<Line> out = new ArrayList<>();
        Bench bench = scenario.bench();

        out.add(Line.builder().add(Tone.HEADING, "Motor   ").add(r.motor().id()).add(Tone.DIM, "  " + r.motor().label()).build());
        out.add(Line.builder().add(Tone.HEADING, "Switch  ").add(r.powerSwitch().id()).add(" x4")
                .add(Tone.DIM, "  " + r.powerSwitch().label() + " (" + r.powerSwitch().packageName() + ")").build());
        out.add(Line.builder().add(Tone.HEADING, "Drive   ")
                .add("PWM " + Cells.engineering(r.pwmFrequency(), "Hz") + ", gear " + Cells.number(r.gearRatio()) + ":1, "
                        + bench.modulation().fileName() + ", bus " + Cells.number(bench.busVoltage()) + " V ("
                        + Cells.number(bench.busVoltageMin()) + " to " + Cells.number(bench.busVoltageMax()) + " V)")
                .build());
        boolean feasible = r.feasible();
        out.add(Line.builder().add(Tone.HEADING, "Verdict ")
                .addReversed(feasible ? Tone.GOOD : Tone.BAD, feasible ? " ok " : " FAIL ")
                .add("  binding: " + r.binding().title() + ", margin " + Cells.signedPercent(r.bindingMargin()))
                .build());
        out.add(Line.blank());

        // Margins, smallest first, with a bar of the margin's size.
        out.add(Line.of(Tone.HEADING, "Margins (limit - value) / limit, smallest first"));
        int titleWidth = 0;
        for (Constraint c : Constraint.values()) {
            titleWidth = Math.max(titleWidth, c.title().length());
        }
        List<Map.Entry<Constraint, Double>> margins = new ArrayList<>(r.margins().entrySet());
        margins.sort(Map.Entry.comparingByValue(Comparator.nullsLast(Comparator.naturalOrder())));
        int barWidth = Math.max(5, Math.min(30, width - titleWidth - 36));
        for (Map.Entry<Constraint, Double> e : margins) {
            double m = e.getValue();
            boolean binding = e.getKey() == r.binding();
            String mark = binding ? g.bindingMark() + " " : "  ";
            String text = KeyMap.pad(e.getKey().title(), titleWidth) + "  " + pad(Cells.signedPercent(m), 8, true);
            String word = m < 0 ? " violated" : m < 0.1 ? " thin    " : "         ";
            Tone tone = m < 0 ? Tone.BAD : m < 0.1 ? Tone.WARN : Tone.NORMAL;
            Line.Builder line = Line.builder().add(Tone.HEADING, " " + mark);
            if (binding) {
                line.addReversed(tone, text);
            } else {
                line.add(tone, text);
            }
            line.add(tone, word).add(Tone.DIM, "  " + bar(Math.max(0, Math.min(1, m)), barWidth, g));
            if (binding) {
                line.add(Tone.HEADING, "  binding");
            }
            out.add(line.build());
        }
        out.add(Line.blank());

        Totals t = r.totals();
        out.add(Line.of(Tone.HEADING, "Over the cycle"));
        out.add(Line.of(String.format(Locale.ROOT, "  current  RMS %s, peak %s, ripple %s p-p, largest duty %s%%",
                Cells.engineering(t.currentRms(), "A"), Cells.engineering(t.currentPeak(), "A"),
                Cells.engineering(t.ripplePeakToPeak(), "A"), Cells.percent(t.dutyMax()))));
        out.add(Line.of(String.format(Locale.ROOT, "  losses   bridge %s, motor %s, gate drive %s; efficiency %s%%",
                Cells.engineering(t.bridgeLoss(), "W"), Cells.engineering(t.motorLoss(), "W"),
                Cells.engineering(t.gateDriveLoss(), "W"), Cells.percent(t.efficiency()))));
        out.add(Line.of(String.format(Locale.ROOT, "  energy   from the bus %s, to the load %s per cycle",
                Cells.engineering(t.energyIn(), "J"), Cells.engineering(t.energyOut(), "J"))));
        out.add(Line.of(String.format(Locale.ROOT, "  hottest  junction %s %s, winding %s %s; cost %s, motor mass %s",
                Cells.number(t.junctionTempMax()), deg, Cells.number(t.windingTempMax()), deg,
                Cells.fixed(t.cost(), 2), Cells.number(t.mass()) + " kg")));
        out.add(Line.blank());

        List<SegmentResult> segments = r.segments();
        int labelWidth = labelWidth(segments);
        // Laid out to fit the screen (narrower cells, then two lines a segment) so that every
        // column, the junction temperature last, is readable without scrolling sideways.
        out.add(Line.of(Tone.HEADING, "Per segment"));
        FittedTable table = segmentTable(segments, labelWidth, deg);
        out.addAll(table.lines(width));
        out.add(Line.blank());

        double cycle = 0;
        for (SegmentResult s : segments) {
            cycle += s.duration();
        }
        out.add(Line.of(Tone.HEADING, "Losses per switch, W (cycle average)"));
        out.add(Line.of(Tone.DIM, "  switch" + row("conduct", "switch", "Coss", "dead", "recover", "total", "Tj max " + deg)));
        List<String> positions = new ArrayList<>();
        for (SegmentResult s : segments) {
            for (SwitchLoss l : s.switchLosses()) {
                if (!positions.contains(l.position())) {
                    positions.add(l.position());
                }
            }
        }
        for (int p = 0; p < positions.size(); p++) {
            double[] sums = new double[6];
            double tjMax = Double.NEGATIVE_INFINITY;
            for (SegmentResult s : segments) {
                for (SwitchLoss l : s.switchLosses()) {
                    if (l.position().equals(positions.get(p))) {
                        double w = cycle > 0 ? s.duration() / cycle : 0;
                        sums[0] += w * l.conduction();
                        sums[1] += w * l.switching();
                        sums[2] += w * l.outputCapacitance();
                        sums[3] += w * l.deadTimeDiode();
                        sums[4] += w * l.reverseRecovery();
                        sums[5] += w * l.total();
                    }
                }
                double[] tj = s.junctionTemps();
                if (p < tj.length) {
                    tjMax = Math.max(tjMax, tj[p]);
                }
            }
            out.add(Line.of("  " + KeyMap.pad(positions.get(p), 6) + row(Cells.number(sums[0]), Cells.number(sums[1]),
                    Cells.number(sums[2]), Cells.number(sums[3]), Cells.number(sums[4]), Cells.number(sums[5]),
                    Cells.number(tjMax))));
        }
        double copper = 0;
        double friction = 0;
        double gate = 0;
        for (SegmentResult s : segments) {
            double w = cycle > 0 ? s.duration() / cycle : 0;
            copper += w * s.copperLoss();
            friction += w * s.frictionLoss();
            gate += w * s.gateDriveLoss();
        }
        out.add(Line.of(Tone.HEADING, "Motor and driver, W (cycle average)"));
        out.add(Line.of(String.format(Locale.ROOT, "  copper %s, friction %s, gate drive %s",
                Cells.number(copper), Cells.number(friction), Cells.number(gate))));
        out.add(Line.blank());

        out.add(Line.of(Tone.HEADING, "Advisories"));
        if (r.advisories().isEmpty()) {
            out.add(Line.of("  none"));
        } else {
            for (Advisory a : Advisory.values()) {
                if (r.advisories().contains(a)) {
                    out.add(Line.builder().add(Tone.WARN, "  ! ").add(a.message()).build());
                }
            }
        }
        out.add(Line.blank());

        int plotWidth = Math.max(10, Math.min(72, width - 22));
        double[] rms = new double[segments.size()];
        double[] temps = new double[segments.size()];
        for (int i = 0; i < rms.length; i++) {
            rms[i] = segments.get(i).currentRms();
            temps[i] = segments.get(i).windingTempPeak();
        }
        out.add(Line.of(Tone.HEADING, "Over the cycle (time runs left to right, " + Cells.number(cycle) + " s)"));
        out.addAll(sparkline("I rms A", rms, segments, cycle, plotWidth, g, true));
        out.addAll(sparkline("Tw " + deg, temps, segments, cycle, plotWidth, g, false));
        out.add(Line.blank());
        out.add(Line.of(Tone.HEADING, "RMS current and hottest winding per segment"));
        double rmsMax = max(rms);
        double tempMax = max(temps);
        double tempMin = Math.min(scenario.bench().ambientTemp(), min(temps));
        int bars = Math.max(5, Math.min(30, (width - labelWidth - 30) / 2));
        for (int i = 0; i < segments.size(); i++) {
            out.add(Line.builder().add("  " + KeyMap.pad(Painter.clip(segments.get(i).label(), labelWidth), labelWidth) + " ")
                    .add(Tone.GOOD, bar(rmsMax > 0 ? rms[i] / rmsMax : 0, bars, g))
                    .add(pad(Cells.number(rms[i]), 7, true) + " A  ")
                    .add(Tone.WARN, bar(tempMax > tempMin ? (temps[i] - tempMin) / (tempMax - tempMin) : 0, bars, g))
                    .add(pad(Cells.number(temps[i]), 6, true) + " " + deg)
                    .build());
        }
        out.add(Line.blank());
        out.add(Line.of(Tone.DIM, "Screening estimates: measure the built drive (press c for the cautions)."));
        return out;
    }

    /** The per-segment table: time, speed, torque, currents, voltage, duty, ripple, winding and hottest junction. */
    static FittedTable segmentTable(List<SegmentResult> segments, int labelWidth, String deg) {
        FittedTable table = new FittedTable("segment", labelWidth, List.of(
                "time s", "rpm", "N*m", "I avg", "I rms", "I pk", "V", "duty%", "ripple", "Tw " + deg, "Tj " + deg));
        for (SegmentResult s : segments) {
            double tj = Double.NEGATIVE_INFINITY;
            for (double j : s.junctionTemps()) {
                tj = Math.max(tj, j);
            }
            table.add(s.label(), List.of(
                    Cells.number(s.duration()), Cells.number(s.motorSpeed() * RPM_PER_RAD_S), Cells.number(s.motorTorque()),
                    Cells.number(s.currentAvg()), Cells.number(s.currentRms()), Cells.number(s.currentPeak()),
                    Cells.number(s.terminalVoltage()), Cells.percent(s.duty()), Cells.number(s.currentRipplePp()),
                    Cells.number(s.windingTempPeak()), Cells.number(tj)));
        }
        return table;
    }

    /** Width of the segment-label column: the longest label, between 7 and 16 columns. */
    static int labelWidth(List<SegmentResult> segments) {
        int labelWidth = 7;
        for (SegmentResult s : segments) {
            labelWidth = Math.max(labelWidth, Math.min(16, s.label().length()));
        }
        return labelWidth;
    }

    private static String row(String... cells) {
        StringBuilder s = new StringBuilder();
        for (String c : cells) {
            s.append(pad(c, 8, true));
        }
        return s.toString();
    }

    private static String pad(String s, int width, boolean right) {
        if (s.length() >= width) {
            return " " + s;
        }
        String sp = " ".repeat(width - s.length());
        return right ? sp + s : s + sp;
    }

    static String bar(double fraction, int width, Glyphs g) {
        int full = (int) Math.round(Math.max(0, Math.min(1, fraction)) * width);
        return String.valueOf(g.barFull()).repeat(full) + String.valueOf(g.barEmpty()).repeat(width - full);
    }

    /** A sparkline of a per-segment value sampled along the cycle's time axis, with its range. */
    private static List<Line> sparkline(String title, double[] values, List<SegmentResult> segments, double cycle,
            int width, Glyphs g, boolean fromZero) {
        double hi = max(values);
        double lo = fromZero ? Math.min(0, min(values)) : min(values);
        StringBuilder s = new StringBuilder();
        for (int x = 0; x < width; x++) {
            double time = cycle * (x + 0.5) / width;
            int seg = 0;
            double acc = 0;
            for (int i = 0; i < segments.size(); i++) {
                acc += segments.get(i).duration();
                seg = i;
                if (time < acc) {
                    break;
                }
            }
            double v = values.length == 0 ? 0 : values[seg];
            s.append(g.level(hi > lo ? (v - lo) / (hi - lo) : 0.5));
        }
        List<Line> out = new ArrayList<>();
        out.add(Line.builder().add("  " + KeyMap.pad(title, 9)).add(Tone.GOOD, s.toString())
                .add(Tone.DIM, "  " + Cells.number(lo) + " to " + Cells.number(hi)).build());
        return out;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return v.length == 0 ? 0 : m;
    }

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return v.length == 0 ? 0 : m;
    }
}
