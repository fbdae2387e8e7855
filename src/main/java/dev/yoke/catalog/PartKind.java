package dev.yoke.catalog;

/** The kinds of section a Yoke file holds, each with the YAML key that introduces it. */
public enum PartKind {
    /** The top level of a catalog file. */
    CATALOG("", "catalog file"),
    /** One entry of a catalog's {@code motors:} list. */
    MOTOR("motors", "motor"),
    /** One entry of a catalog's {@code switches:} list. */
    SWITCH("switches", "switch"),
    /** The top level of a scenario file. */
    SCENARIO("", "scenario"),
    /** A scenario's {@code bench:} section. */
    BENCH("bench", "bench"),
    /** The bench's {@code limits:} section. */
    LIMITS("limits", "limits"),
    /** A scenario's {@code profile:} section. */
    PROFILE("profile", "profile"),
    /** One entry of the profile's {@code segments:} list. */
    SEGMENT("segments", "segment");

    private final String key;
    private final String noun;

    PartKind(String key, String noun) {
        this.key = key;
        this.noun = noun;
    }

    /** The YAML key of the section or list ("" for a file's top level). */
    public String key() {
        return key;
    }

    /** One of these, in words: "motor", "switch", "segment". */
    public String noun() {
        return noun;
    }
}
