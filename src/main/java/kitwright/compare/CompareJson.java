package kitwright.compare;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.util.List;

/**
 * Writes {@code compare.json}: {@code {"options":[...]}} with one object per option, keys in the fixed order of
 * {@link OptionSummary}, unknown figures as null, numbers in plain notation (no exponent), two-space indentation
 * and a final newline. Same options, same bytes.
 */
public final class CompareJson {
    private static final ObjectMapper MAPPER = mapper();

    private CompareJson() {
    }

    /** The document written: the options in their given order. */
    public record Document(List<OptionSummary> options) {
        public Document {
            options = List.copyOf(options);
        }
    }

    public static void write(List<OptionSummary> options, Writer out) throws IOException {
        out.write(toJson(options));
    }

    public static String toJson(List<OptionSummary> options) throws IOException {
        return MAPPER.writeValueAsString(new Document(options)).replace("\r\n", "\n") + "\n";
    }

    /** Reads a compare.json back (for tests and tools). */
    public static Document read(String json) throws IOException {
        return MAPPER.readValue(json, Document.class);
    }

    private static ObjectMapper mapper() {
        JsonSerializer<Double> plain = new JsonSerializer<>() {
            @Override
            public void serialize(Double value, JsonGenerator gen, SerializerProvider serializers) throws IOException {
                gen.writeNumber(BigDecimal.valueOf(value).toPlainString());
            }
        };
        SimpleModule module = new SimpleModule("plain-numbers");
        module.addSerializer(Double.class, plain);
        module.addSerializer(double.class, plain);
        return new ObjectMapper().registerModule(module).enable(SerializationFeature.INDENT_OUTPUT);
    }
}
