package dev.yoke.catalog;

import java.util.List;

/**
 * The key tables of the file-format documentation, generated from {@link PartFields} so that the
 * documentation cannot drift from what the loader accepts (a test compares them with
 * {@code docs/file-formats.md}).
 */
public final class FormatReference {

    private FormatReference() {
    }

    /** A Markdown table of the keys of {@code kind}. */
    public static String table(PartKind kind) {
        StringBuilder b = new StringBuilder();
        b.append("| key | unit | plain number in | required / default | allowed | meaning |\n");
        b.append("|---|---|---|---|---|---|\n");
        for (FieldSpec f : PartFields.of(kind)) {
            String need = f.required() ? "required" : f.defaultText().isEmpty() ? "optional" : "default " + f.defaultText();
            if (f.key().endsWith("_constant")) {
                need = "one of three";
            }
            String allowed = f.isQuantity() ? f.range().describe(f.dimension()) : "";
            String plain = f.isQuantity() && !f.dimension().plainUnit().isEmpty()
                    ? "`" + f.dimension().plainUnit() + "`" : "";
            b.append("| `").append(f.key()).append("` | ").append(escape(f.unitText())).append(" | ")
                    .append(plain).append(" | ").append(escape(need)).append(" | ").append(escape(allowed)).append(" | ")
                    .append(escape(f.description())).append(" |\n");
        }
        return b.toString();
    }

    /** Every section's table, each under a {@code ### kind} heading, in documentation order. */
    public static String allTables() {
        StringBuilder b = new StringBuilder();
        for (PartKind kind : List.of(PartKind.CATALOG, PartKind.MOTOR, PartKind.SWITCH, PartKind.SCENARIO,
                PartKind.BENCH, PartKind.LIMITS, PartKind.PROFILE, PartKind.SEGMENT)) {
            String where = kind.key().isEmpty() ? "top level of a " + kind.noun() : "`" + kind.key() + ":`";
            if (kind == PartKind.SCENARIO) {
                where = "top level of a scenario file";
            }
            b.append("### ").append(kind.noun()).append(" (").append(where).append(")\n\n");
            b.append(table(kind)).append('\n');
        }
        return b.toString();
    }

    private static String escape(String s) {
        return s.replace("|", "\\|");
    }
}
