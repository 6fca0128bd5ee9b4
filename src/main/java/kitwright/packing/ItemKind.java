package kitwright.packing;

import com.fasterxml.jackson.annotation.JsonValue;

/** What lies in a crate: a bundle of nested tubes, or a box of joints. */
public enum ItemKind {
    BUNDLE, BOX;

    /** The word used in JSON and CSV: {@code bundle} or {@code box}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
