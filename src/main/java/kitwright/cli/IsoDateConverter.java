package kitwright.cli;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import picocli.CommandLine;

/** Reads a {@code --date} option as an ISO date, with a message that shows the expected form. */
final class IsoDateConverter implements CommandLine.ITypeConverter<LocalDate> {
    @Override
    public LocalDate convert(String value) {
        try {
            return LocalDate.parse(value);
        } catch (DateTimeParseException e) {
            throw new CommandLine.TypeConversionException("'" + value
                    + "' is not a date (expected YYYY-MM-DD, e.g. 2025-06-30)");
        }
    }
}
