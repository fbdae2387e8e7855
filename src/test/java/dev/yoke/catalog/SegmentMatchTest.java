package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import dev.yoke.model.Segment;
import java.util.List;
import org.junit.jupiter.api.Test;

/** How edited profile rows are paired with the file's, so that a save keeps the right lines. */
class SegmentMatchTest {

    private static final Segment A = new Segment("start", 1, 0, 6, 1.2);
    private static final Segment B = new Segment("run", 600, 6, 6, 1.2);
    private static final Segment C = new Segment("stop", 0.5, 6, 0, 1.2);
    private static final List<Segment> FILE = List.of(A, B, C);

    @Test
    void unchangedRowsPairWithThemselves() {
        assertArrayEquals(new int[] {0, 1, 2}, SegmentMatch.sources(FILE, FILE));
    }

    @Test
    void copiedRowLeavesTheOriginalPairedAndIsNew() {
        // The editor's "add" puts a copy of the current row below it.
        assertArrayEquals(new int[] {0, 1, -1, 2}, SegmentMatch.sources(FILE, List.of(A, B, B, C)));
    }

    @Test
    void movedRowsFollowTheirValues() {
        assertArrayEquals(new int[] {1, 2, 0}, SegmentMatch.sources(FILE, List.of(B, C, A)));
    }

    @Test
    void removedRowIsNotPaired() {
        assertArrayEquals(new int[] {0, 2}, SegmentMatch.sources(FILE, List.of(A, C)));
    }

    @Test
    void rowKeepingThreeOfItsFiveValuesIsTheSameRowEvenWhenMoved() {
        Segment slower = new Segment("run slower", 600, 6, 5, 1.2); // label and end speed changed
        assertArrayEquals(new int[] {1, 0, 2}, SegmentMatch.sources(FILE, List.of(slower, A, C)));
    }

    @Test
    void rowKeepingItsLabelIsTheSameRowWhateverElseChanged() {
        Segment rewritten = new Segment("run", 30, 2, 3, 0.4);
        assertArrayEquals(new int[] {1, 0, 2}, SegmentMatch.sources(FILE, List.of(rewritten, A, C)));
    }

    @Test
    void rowRewrittenBetweenTheSameNeighboursIsTheSameRow() {
        Segment rewritten = new Segment("cruise", 30, 2, 3, 0.4); // nothing in common with "run"
        assertArrayEquals(new int[] {0, 1, 2}, SegmentMatch.sources(FILE, List.of(A, rewritten, C)));
    }

    @Test
    void rowUnlikeAnyIsNewWhenTheListGrew() {
        Segment other = new Segment("cruise", 30, 2, 3, 0.4);
        assertArrayEquals(new int[] {0, 1, 2, -1}, SegmentMatch.sources(FILE, List.of(A, B, C, other)));
    }

    @Test
    void removedRowAndUnlikeNewRowStayApartWhenTheLengthChanged() {
        Segment other = new Segment("cruise", 30, 2, 3, 0.4);
        assertArrayEquals(new int[] {0, -1}, SegmentMatch.sources(FILE, List.of(A, other)));
        assertArrayEquals(new int[] {-1, 2}, SegmentMatch.sources(FILE, List.of(other, C)));
    }

    @Test
    void rowsOfAListThatKeptItsLengthArePairedInOrder() {
        // "run" rewritten as "cruise" and moved below "stop": without row identities, a list of
        // the same length is read as edits and moves, so "run"'s lines (and comments) follow it.
        Segment other = new Segment("cruise", 30, 2, 3, 0.4);
        assertArrayEquals(new int[] {0, 2, 1}, SegmentMatch.sources(FILE, List.of(A, C, other)));
    }
}
