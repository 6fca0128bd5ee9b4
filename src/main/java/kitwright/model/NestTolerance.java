package kitwright.model;

import com.fasterxml.jackson.annotation.JsonValue;

/** Which tube sizes the nesting fit rule compares: worst-case tolerances or nominal sizes. */
public enum NestTolerance {
    WORST_CASE("worst-case"), NOMINAL("nominal");

    private final String code;

    NestTolerance(String code) {
        this.code = code;
    }

    @JsonValue
    public String code() {
        return code;
    }

    public static java.util.Optional<NestTolerance> parse(String text) {
        for (NestTolerance t : values()) {
            if (t.code.equalsIgnoreCase(text.trim())) {
                return java.util.Optional.of(t);
            }
        }
        return java.util.Optional.empty();
    }
}
