package kitwright.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import kitwright.model.Bar;
import kitwright.model.CrateType;
import kitwright.model.InputFiles;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;
import kitwright.model.VehicleType;

/**
 * Reads and validates a whole kit: {@code kit.json} (optional), {@code bars.csv}, the optional
 * {@code structures.csv} and {@code joints.csv} (or, in their place, the sheets of {@code kit.xlsx}: see
 * {@link KitTables}), and the catalogs kit.json names or that lie beside the tube catalog (CSV files, or
 * {@code .xlsx} workbooks read from their first sheet). Every file is read and every problem collected before
 * anything is thrown, so one run lists all that
 * must be fixed.
 */
public final class KitReader {
    public static final String KIT_JSON = "kit.json";
    public static final String BARS = "bars.csv";
    public static final String STRUCTURES = "structures.csv";
    public static final String JOINTS = "joints.csv";
    /** The kit's tables as one workbook, with the sheets bars, structures and joints. */
    public static final String WORKBOOK = "kit.xlsx";

    private KitReader() {
    }

    /** Reads a kit folder; throws with every problem found. */
    public static Kit read(Path kitDir) throws InvalidInputException {
        Problems problems = new Problems();
        if (!Files.isDirectory(kitDir)) {
            String wrong = Files.exists(kitDir) ? "this is a file, not a folder" : "folder not found";
            throw new InvalidInputException(Problem.ofFile(kitDir, wrong
                    + " (expected a kit folder holding bars.csv and kit.json)"));
        }
        if (!Files.isReadable(kitDir) || !Files.isExecutable(kitDir)) {
            throw new InvalidInputException(Problem.ofFile(kitDir, "cannot read the folder: permission denied"
                    + " (expected a kit folder you may read; check its permissions)"));
        }
        Path kitJsonFile = kitDir.resolve(KIT_JSON);
        KitJson kitJson = KitJsonReader.defaults(kitDir);
        if (present(kitJsonFile)) {
            kitJson = KitJsonReader.read(kitJsonFile, kitDir, problems).orElse(null);
            if (kitJson == null) {
                problems.throwIfAny(); // without settings the other files cannot be judged
            }
        }
        KitSettings settings = kitJson.settings();
        Map<String, Material> materials = materials(kitJson.materialsFile(), kitJson.materials() != null, problems);
        boolean catalogNamed = !kitJson.stockCatalog().equals(KitJsonReader.defaults(kitDir).stockCatalog());
        TubeCatalog catalog = catalog(kitJson.stockCatalog(), catalogNamed, materials, kitJson.materialsFile(),
                problems);
        List<CrateType> crates = List.of();
        if (kitJson.crateCatalog() != null || present(kitJson.crateCatalogFile())) {
            crates = CrateCatalogReader.read(kitJson.crateCatalogFile(), problems);
        }
        List<VehicleType> vehicles = List.of();
        if (kitJson.vehicleCatalog() != null || present(kitJson.vehicleCatalogFile())) {
            vehicles = VehicleCatalogReader.read(kitJson.vehicleCatalogFile(), problems);
        }
        KitTables tables = KitTables.of(kitDir, kitJson.csv(), problems).orElse(null);
        if (tables == null) {
            problems.throwIfAny(); // without knowing where the bars are, the kit cannot be judged
        }
        BarsReader.Rows lines = BarsReader.readRows(tables.bars(), problems);
        int beforeStructures = problems.count();
        List<Sourced<StructureCount>> structures = tables.structures() != null
                ? StructuresReader.read(tables.structures(), problems) : List.of();
        boolean structuresReadable = problems.count() == beforeStructures;
        TourCheck.check(kitJson.tour(), tables.structuresName(), tables.structures() != null, structuresReadable,
                structures, problems);
        List<Joint> joints = tables.joints() != null
                ? JointsReader.read(tables.joints(), settings.jointBox(), problems) : List.of();
        Set<String> jointMarks = new LinkedHashSet<>();
        joints.forEach(j -> jointMarks.add(j.mark()));
        List<Bar> bars = KitAssembler.marks(settings, lines, structures, structuresReadable, jointMarks, catalog,
                problems, new KitAssembler.TableNames(tables.barsName(), tables.structuresName(),
                        tables.jointsName()));
        kerfProblem(settings.kerfMm(), catalog).ifPresent(message -> problems.add(kitJsonFile,
                lineOf(kitJsonFile, "\"kerfMm\""), "kerfMm", message));
        problems.throwIfAny();
        return new Kit(kitDir, settings, bars, structures.stream().map(Sourced::value).toList(), joints, catalog,
                materials == null ? Map.of() : materials, crates, vehicles, new InputFiles(
                        materials == null ? null : kitJson.materialsFile(),
                        crates.isEmpty() ? null : kitJson.crateCatalogFile(),
                        vehicles.isEmpty() ? null : kitJson.vehicleCatalogFile(), tables.workbook(),
                        tables.sheets()));
    }

    /**
     * Assembles a kit from loose files, for stand-alone runs ({@code --bars FILE --stock FILE [--materials FILE]}):
     * no structures, joints, crates or vehicles.
     *
     * @param materialsFile materials file, or null to leave masses out
     */
    public static Kit fromFiles(Path barsFile, Path stockCatalog, Path materialsFile, KitSettings settings)
            throws InvalidInputException {
        Problems problems = new Problems();
        Map<String, Material> materials = materialsFile == null ? null : materials(materialsFile, true, problems);
        TubeCatalog catalog = catalog(stockCatalog, true, materials, materialsFile, problems);
        List<Sourced<BarLine>> lines = BarsReader.read(barsFile, problems);
        List<Bar> bars = KitAssembler.marks(settings, lines, List.of(), catalog, problems);
        problems.throwIfAny();
        return new Kit(null, settings, bars, List.of(), List.of(), catalog,
                materials == null ? Map.of() : materials, List.of(), List.of(),
                new InputFiles(materialsFile, null, null));
    }

    /**
     * Why a kerf cannot be the saw's, or empty when it can: a kerf at least as long as a stock length of the
     * catalog (a typing slip, 13000 for 1.3) would plan one piece per stock length and offcuts past its end.
     *
     * @param catalog the tube catalog, or null when it could not be read (no check)
     */
    public static Optional<String> kerfProblem(double kerfMm, TubeCatalog catalog) {
        if (catalog == null) {
            return Optional.empty();
        }
        return catalog.stock().stream().min(Comparator.comparingDouble(StockLength::lengthMm))
                .filter(shortest -> kerfMm >= shortest.lengthMm())
                .map(shortest -> "the kerf " + Figures.plain(kerfMm) + " mm is not shorter than the stock length "
                        + Figures.plain(shortest.lengthMm()) + " mm of " + shortest.section() + " (expected a saw"
                        + " kerf of a few millimetres, shorter than every stock length)");
    }

    /** The first line of a small text file holding {@code text}, or 0 (the whole file) when none does. */
    private static int lineOf(Path file, String text) {
        try {
            List<String> lines = Files.readAllLines(file);
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).contains(text)) {
                    return i + 1;
                }
            }
        } catch (IOException | UncheckedIOException e) {
            return 0; // the file was read before; a line number is a courtesy
        }
        return 0;
    }

    /**
     * True unless the file is known to be absent: a file in a folder one may not read is neither known to exist
     * nor known to be absent, and is read so that the reader reports "permission denied", not "file not found".
     */
    static boolean present(Path file) {
        return !Files.notExists(file);
    }

    /** The materials, or null when a defaulted file is absent or the file has problems (no material check). */
    static Map<String, Material> materials(Path file, boolean named, Problems problems) {
        if (!named && !present(file)) {
            return null;
        }
        int before = problems.count();
        Map<String, Material> materials = MaterialsReader.read(file, problems);
        return problems.count() == before ? materials : null;
    }

    /** The tube catalog, or null when it is missing or has problems (section checks would mislead). */
    static TubeCatalog catalog(Path file, boolean named, Map<String, Material> materials,
                                       Path materialsFile, Problems problems) {
        if (!present(file)) {
            String hint = named ? "check the path; kit.json paths are relative to the kit folder"
                    : "put stock.csv in the kit folder or name the catalog in kit.json as \"stockCatalog\"";
            problems.add(Problem.ofFile(file, "file not found (expected a tube catalog with the columns "
                    + TubeCatalogReader.COLUMNS.header() + "; " + hint + ")"));
            return null;
        }
        int before = problems.count();
        TubeCatalog catalog = TubeCatalogReader.read(file, materials, materialsFile, problems).orElse(null);
        return problems.count() == before ? catalog : null;
    }
}
