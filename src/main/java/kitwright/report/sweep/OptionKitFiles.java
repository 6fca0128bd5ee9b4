package kitwright.report.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.io.KitJson;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.io.SweepInput;
import kitwright.report.CsvFile;
import kitwright.sweep.SweepOption;

/**
 * The files of one option's kit folder ({@code DIR/kNN}), which {@code check} and {@code plan} read as any kit:
 * kit.json from KIT_DIR's with the option's name and description and every catalog path rewritten relative to the
 * new folder; bars.csv with each mark's node-to-node length (the cut length is derived by the end deduction of
 * kit.json, blank quantities are taken from structures.csv by the kit's usual rule); structures.csv with how many
 * members of each structure take each mark; joints.csv copied byte for byte.
 */
public final class OptionKitFiles {
    static final List<String> BARS_HEADER = List.of("mark", "section", "length_mm", "quantity", "node_to_node_mm",
            "note");
    static final List<String> STRUCTURES_HEADER = List.of("structure", "mark", "count");

    private OptionKitFiles() {
    }

    /**
     * @param folder where the option's folder will stand (DIR/kNN), for the relative catalog paths; a folder beside
     *               it at the same depth (the output's temporary folder) reads the same paths
     * @return file name to content, in writing order
     */
    public static Map<String, byte[]> of(SweepInput input, SweepOption option, Path folder) throws IOException {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(KitReader.KIT_JSON, bytes(PrettyJson.write(kitJson(input, option, folder))));
        files.put(KitReader.BARS, bytes(bars(option)));
        files.put(KitReader.STRUCTURES, bytes(structures(option)));
        Path joints = input.kitDir().resolve(KitReader.JOINTS);
        if (Files.isRegularFile(joints)) {
            files.put(KitReader.JOINTS, Files.readAllBytes(joints));
        }
        return files;
    }

    static ObjectNode kitJson(SweepInput input, SweepOption option, Path folder) throws IOException {
        Path source = input.kitDir().resolve(KitReader.KIT_JSON);
        ObjectNode json = JsonNodeFactory.instance.objectNode();
        if (Files.isRegularFile(source)) {
            JsonNode read = PrettyJson.mapper().readTree(source.toFile());
            if (read instanceof ObjectNode object) {
                json = object; // read and checked cleanly before
            }
        }
        KitJson kit = input.kitJson();
        String base = kit.settings().name();
        String description = kit.settings().description();
        ObjectNode out = JsonNodeFactory.instance.objectNode();
        out.put("name", base + "-" + option.kit());
        out.put("description", (description.isBlank() ? "" : description.strip() + " ") + String.format(Locale.ROOT,
                "Sweep option %s: %d marks grouped from members.csv, largest change %.1f mm, mean change %.2f mm."
                        + " The structures must be re-solved to these lengths and checked structurally.",
                option.kit(), option.marks(), option.largestChangeMm(), option.meanChangeMm()));
        out.put("stockCatalog", relative(folder, kit.stockCatalog()));
        putPath(out, "materials", kit.materials(), folder);
        putPath(out, "crateCatalog", kit.crateCatalog(), folder);
        putPath(out, "vehicleCatalog", kit.vehicleCatalog(), folder);
        json.fields().forEachRemaining(e -> {
            if (!out.has(e.getKey()) && !List.of("materials", "crateCatalog", "vehicleCatalog").contains(e.getKey())) {
                out.set(e.getKey(), e.getValue());
            }
        });
        return out;
    }

    private static void putPath(ObjectNode out, String key, Path path, Path folder) {
        if (path != null) {
            out.put(key, relative(folder, path));
        }
    }

    /** {@code file} as seen from {@code folder}, with forward slashes, as kit.json paths are written. */
    static String relative(Path folder, Path file) {
        Path from = folder.toAbsolutePath().normalize();
        Path to = file.toAbsolutePath().normalize();
        Path rel = from.getRoot() != null && from.getRoot().equals(to.getRoot()) ? from.relativize(to) : to;
        return rel.toString().replace(File.separatorChar, '/');
    }

    static String bars(SweepOption option) {
        Map<String, Integer> served = new LinkedHashMap<>();
        option.members().forEach(m -> served.merge(m.mark(), 1, Integer::sum));
        List<List<String>> rows = new ArrayList<>();
        for (SweepOption.KitMark mark : option.kitMarks()) {
            String note = mark.shortestTenths() == mark.longestTenths()
                    ? served.get(mark.name()) + " members of " + tenths(mark.shortestTenths()) + " mm"
                    : served.get(mark.name()) + " members of " + tenths(mark.shortestTenths()) + " to "
                    + tenths(mark.longestTenths()) + " mm";
            rows.add(List.of(mark.name(), mark.section(), "", "", tenths(mark.nodeToNodeTenths()), note));
        }
        return CsvFile.text(BARS_HEADER, rows);
    }

    static String structures(SweepOption option) {
        Map<String, Map<String, Integer>> counts = new LinkedHashMap<>();
        for (SweepOption.MemberMark m : option.members()) {
            counts.computeIfAbsent(m.member().structure(), s -> new LinkedHashMap<>()).merge(m.mark(), 1,
                    Integer::sum);
        }
        List<List<String>> rows = new ArrayList<>();
        counts.forEach((structure, byMark) -> option.kitMarks().forEach(mark -> {
            Integer n = byMark.get(mark.name());
            if (n != null) {
                rows.add(List.of(structure, mark.name(), Integer.toString(n)));
            }
        }));
        return CsvFile.text(STRUCTURES_HEADER, rows);
    }

    /** Tenths of a millimetre as millimetres in plain notation: 24125 is 2412.5, 24120 is 2412. */
    static String tenths(long tenths) {
        return tenths % 10 == 0 ? Long.toString(tenths / 10)
                : (tenths < 0 ? "-" : "") + Math.abs(tenths) / 10 + "." + Math.abs(tenths) % 10;
    }

    private static byte[] bytes(String text) {
        return text.getBytes(java.nio.charset.StandardCharsets.UTF_8);
    }
}
