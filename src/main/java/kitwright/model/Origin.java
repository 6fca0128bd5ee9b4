package kitwright.model;

import com.fasterxml.jackson.annotation.JsonValue;

/** Where a stock piece comes from: bought from the mill or stockholder, or an offcut already on the rack. */
public enum Origin {
    MILL, RACK;

    /** The word used in catalogs, CSV and JSON: {@code mill} or {@code rack}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    public static java.util.Optional<Origin> parse(String text) {
        for (Origin o : values()) {
            if (o.code().equalsIgnoreCase(text.trim())) {
                return java.util.Optional.of(o);
            }
        }
        return java.util.Optional.empty();
    }
}
