package dev.yoke.catalog;

import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * Which segment of the file each segment of an edited profile came from, so that a save can keep
 * the lines (and comments) of every segment the user kept, edited or moved, and write only the
 * new ones afresh. The editor hands over plain values, not row identities, so the pairing is
 * inferred, in four passes of decreasing certainty:
 * <ol>
 *   <li>an unchanged segment: equal in every value, the nearest unused one in the file when
 *       several are (a copied row keeps the original above it paired, the copy is new);</li>
 *   <li>an edited segment: the same label, or at least {@value #SIMILAR} of its five values the
 *       same; the best-kept pairs first, then the nearest;</li>
 *   <li>rewritten segments: a run of unpaired rows between the same two paired neighbours (or
 *       list ends) as an equally long run of unpaired segments of the file, paired in order;</li>
 *   <li>when the list kept its length, rows were edited and moved but none added or removed: the
 *       rest are paired in order.</li>
 * </ol>
 * Whatever stays unpaired was removed (in the file) or added (in the edit).
 */
final class SegmentMatch {

    /** Values of five that must agree for an edited segment to count as the same row. */
    static final int SIMILAR = 3;

    private SegmentMatch() {
    }

    /**
     * For each segment of {@code edited}, the index in {@code file} of the segment it is, or -1
     * for a new one; no index appears twice.
     */
    static int[] sources(List<Segment> file, List<Segment> edited) {
        int[] source = new int[edited.size()];
        Arrays.fill(source, -1);
        boolean[] used = new boolean[file.size()];
        for (int j = 0; j < edited.size(); j++) {
            int best = -1;
            for (int i = 0; i < file.size(); i++) {
                if (!used[i] && file.get(i).equals(edited.get(j))
                        && (best < 0 || Math.abs(i - j) < Math.abs(best - j))) {
                    best = i;
                }
            }
            if (best >= 0) {
                source[j] = best;
                used[best] = true;
            }
        }
        List<int[]> similar = new ArrayList<>(); // {i, j, same label, values alike}
        for (int j = 0; j < edited.size(); j++) {
            for (int i = 0; i < file.size(); i++) {
                if (source[j] < 0 && !used[i]) {
                    boolean label = file.get(i).label().equals(edited.get(j).label());
                    int alike = alike(file.get(i), edited.get(j));
                    if (label || alike >= SIMILAR) {
                        similar.add(new int[] {i, j, label ? 1 : 0, alike});
                    }
                }
            }
        }
        similar.sort(Comparator.<int[]>comparingInt(p -> -p[2]).thenComparingInt(p -> -p[3])
                .thenComparingInt(p -> Math.abs(p[0] - p[1])).thenComparingInt(p -> p[0]));
        for (int[] pair : similar) {
            if (source[pair[1]] < 0 && !used[pair[0]]) {
                source[pair[1]] = pair[0];
                used[pair[0]] = true;
            }
        }
        // Runs of unpaired rows between the same two paired neighbours, of equal length on both sides.
        for (int j = 0; j < edited.size(); ) {
            if (source[j] >= 0) {
                j++;
                continue;
            }
            int end = j;
            while (end < edited.size() && source[end] < 0) {
                end++;
            }
            int low = j == 0 ? -1 : source[j - 1];
            int high = end == edited.size() ? file.size() : source[end];
            List<Integer> gap = new ArrayList<>();
            for (int i = low + 1; i < high; i++) {
                if (!used[i]) {
                    gap.add(i);
                }
            }
            if (gap.size() == end - j) {
                for (int k = 0; k < gap.size(); k++) {
                    source[j + k] = gap.get(k);
                    used[gap.get(k)] = true;
                }
            }
            j = end;
        }
        // A list that kept its length had rows edited and moved, none added or removed: pair the rest in order.
        if (file.size() == edited.size()) {
            int i = 0;
            for (int j = 0; j < edited.size(); j++) {
                if (source[j] < 0) {
                    while (used[i]) {
                        i++;
                    }
                    source[j] = i;
                    used[i] = true;
                }
            }
        }
        return source;
    }

    /** How many of the five values (label, duration, speeds, torque) two segments share. */
    private static int alike(Segment a, Segment b) {
        int same = 0;
        same += Objects.equals(a.label(), b.label()) ? 1 : 0;
        same += a.duration() == b.duration() ? 1 : 0;
        same += a.speedStart() == b.speedStart() ? 1 : 0;
        same += a.speedEnd() == b.speedEnd() ? 1 : 0;
        same += a.torque() == b.torque() ? 1 : 0;
        return same;
    }
}
