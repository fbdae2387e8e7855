package dev.yoke.tui;

/** What a ranking reports while it runs, and how it learns that the user stopped it. */
public interface RankProgress {

    /** Pairings evaluated so far out of the total. */
    void report(long done, long total);

    /** True once the user asked to stop; the ranking should return soon after. */
    boolean isCancelled();
}
