package dev.yoke.tui;

/** What a ranking reports while it runs, and how it learns that the user stopped it. */
public interface RankProgress {

    /** Fraction of the pairings evaluated so far, 0 to 1. */
    void report(double fraction);

    /** True once the user asked to stop; the ranking should return soon after. */
    boolean isCancelled();
}
