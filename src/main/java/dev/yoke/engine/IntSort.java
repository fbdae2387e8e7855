package dev.yoke.engine;

/**
 * Stable merge sort of an {@code int[]} of row indexes by a comparator over rows, without
 * boxing (a million {@code Integer}s would cost 16 MB and several times the time).
 * The classic top-down merge sort with insertion sort for short runs and a skip of the merge
 * when the halves are already in order (Sedgewick &amp; Wayne, <i>Algorithms</i>, 4th ed., §2.2).
 */
final class IntSort {

    /** Compares two rows. */
    @FunctionalInterface
    interface RowComparator {
        int compare(int rowA, int rowB);
    }

    private static final int INSERTION_LIMIT = 12;

    private IntSort() {
    }

    /** Sorts {@code a[0..n)} in place. */
    static void sort(int[] a, int n, RowComparator c) {
        if (n < 2) {
            return;
        }
        int[] aux = java.util.Arrays.copyOf(a, n);
        mergeSort(aux, a, 0, n, c);
    }

    /** Sorts src[lo..hi) into dst[lo..hi); src and dst hold the same values on entry. */
    private static void mergeSort(int[] src, int[] dst, int lo, int hi, RowComparator c) {
        int length = hi - lo;
        if (length <= INSERTION_LIMIT) {
            for (int i = lo + 1; i < hi; i++) {
                int v = dst[i];
                int j = i - 1;
                while (j >= lo && c.compare(dst[j], v) > 0) {
                    dst[j + 1] = dst[j];
                    j--;
                }
                dst[j + 1] = v;
            }
            return;
        }
        int mid = (lo + hi) >>> 1;
        mergeSort(dst, src, lo, mid, c);
        mergeSort(dst, src, mid, hi, c);
        if (c.compare(src[mid - 1], src[mid]) <= 0) {
            System.arraycopy(src, lo, dst, lo, length);
            return;
        }
        for (int i = lo, p = lo, q = mid; i < hi; i++) {
            if (q >= hi || (p < mid && c.compare(src[p], src[q]) <= 0)) {
                dst[i] = src[p++];
            } else {
                dst[i] = src[q++];
            }
        }
    }
}
