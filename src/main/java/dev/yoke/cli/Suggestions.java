package dev.yoke.cli;

import dev.yoke.catalog.EditDistance;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/** "Did you mean" for part ids: the closest known id by edit distance (Levenshtein, 1966). */
final class Suggestions {

    private Suggestions() {
    }

    /** The known id closest to {@code typed}, or null when none is reasonably close. */
    static String closest(String typed, List<String> known) {
        String t = typed.toLowerCase(Locale.ROOT);
        return known.stream()
                .map(k -> new Object[] {k, EditDistance.between(t, k.toLowerCase(Locale.ROOT))})
                .filter(p -> (int) p[1] <= Math.max(2, typed.length() / 2))
                .min(Comparator.comparingInt((Object[] p) -> (int) p[1]).thenComparing(p -> (String) p[0]))
                .map(p -> (String) p[0])
                .orElse(null);
    }
}
