package dev.yoke.catalog;

/** What a YAML key holds. */
public enum FieldType {
    /** A number with an optional unit of the field's dimension. */
    QUANTITY,
    /** A list of such numbers (a single number counts as a list of one). */
    QUANTITY_LIST,
    /** A part's key: letters, digits and . _ - + only, so it survives command lines and CSV. */
    IDENTIFIER,
    /** Free text. */
    TEXT,
    /** true or false. */
    BOOLEAN,
    /** bipolar, unipolar or sign-magnitude. */
    MODULATION,
    /** A nested section of keys. */
    SECTION,
    /** A list of nested sections. */
    SECTION_LIST
}
