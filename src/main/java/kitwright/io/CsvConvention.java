package kitwright.io;

/**
 * The column delimiter and decimal sign kit.json states for the kit's own CSV files ({@code "csv": {"delimiter":
 * ";", "decimalSign": ","}}), in place of detecting them ({@link CsvDialect}); a part left out (null) is detected.
 * A file that contradicts a stated part is refused with the line that shows it.
 *
 * @param delimiter   {@code ','} or {@code ';'}, or null to detect it from the header line
 * @param decimalSign {@code '.'} or {@code ','}, or null to detect it from the numbers
 */
public record CsvConvention(Character delimiter, Character decimalSign) {
    /** Nothing stated: both detected. */
    public static final CsvConvention DETECTED = new CsvConvention(null, null);

    public CsvConvention {
        if (delimiter != null && delimiter != ',' && delimiter != ';') {
            throw new IllegalArgumentException("delimiter " + delimiter);
        }
        if (decimalSign != null && decimalSign != '.' && decimalSign != ',') {
            throw new IllegalArgumentException("decimal sign " + decimalSign);
        }
        if (delimiter != null && decimalSign != null && delimiter == ',' && decimalSign == ',') {
            throw new IllegalArgumentException("a decimal comma in a file separated by commas");
        }
    }

    /** How kit.json states a part, for messages: {@code "csv": {"delimiter": ";"}}. */
    static String stated(String key, char value) {
        return "kit.json states \"csv\": {\"" + key + "\": \"" + value + "\"}";
    }
}
