package kitwright.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;
import kitwright.model.VehicleType;

/**
 * Reads and validates a whole kit: {@code kit.json} (optional), {@code bars.csv}, the optional
 * {@code structures.csv} and {@code joints.csv}, and the catalogs kit.json names or that lie beside the tube
 * catalog. Every file is read and every problem collected before anything is thrown, so one run lists all that
 * must be fixed.
 */
public final class KitReader {
    public static final String KIT_JSON = "kit.json";
    public static final String BARS = "bars.csv";
    public static final String STRUCTURES = "structures.csv";
    public static final String JOINTS = "joints.csv";

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
        Path kitJsonFile = kitDir.resolve(KIT_JSON);
        KitJson kitJson = KitJsonReader.defaults(kitDir);
        if (Files.exists(kitJsonFile)) {
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
        if (kitJson.crateCatalog() != null || Files.exists(kitJson.crateCatalogFile())) {
            crates = CrateCatalogReader.read(kitJson.crateCatalogFile(), problems);
        }
        List<VehicleType> vehicles = List.of();
        if (kitJson.vehicleCatalog() != null || Files.exists(kitJson.vehicleCatalogFile())) {
            vehicles = VehicleCatalogReader.read(kitJson.vehicleCatalogFile(), problems);
        }
        BarsReader.Rows lines = BarsReader.readRows(kitDir.resolve(BARS), problems);
        Path structuresFile = kitDir.resolve(STRUCTURES);
        int beforeStructures = problems.count();
        List<Sourced<StructureCount>> structures = Files.exists(structuresFile)
                ? StructuresReader.read(structuresFile, problems) : List.of();
        boolean structuresReadable = problems.count() == beforeStructures;
        Path jointsFile = kitDir.resolve(JOINTS);
        List<Joint> joints = Files.exists(jointsFile)
                ? JointsReader.read(jointsFile, settings.jointBox(), problems) : List.of();
        List<Bar> bars = KitAssembler.marks(settings, lines, structures, structuresReadable, catalog, problems);
        problems.throwIfAny();
        return new Kit(kitDir, settings, bars, structures.stream().map(Sourced::value).toList(), joints, catalog,
                materials == null ? Map.of() : materials, crates, vehicles);
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
                materials == null ? Map.of() : materials, List.of(), List.of());
    }

    /** The materials, or null when a defaulted file is absent or the file has problems (no material check). */
    private static Map<String, Material> materials(Path file, boolean named, Problems problems) {
        if (!named && !Files.exists(file)) {
            return null;
        }
        int before = problems.count();
        Map<String, Material> materials = MaterialsReader.read(file, problems);
        return problems.count() == before ? materials : null;
    }

    /** The tube catalog, or null when it is missing or has problems (section checks would mislead). */
    private static TubeCatalog catalog(Path file, boolean named, Map<String, Material> materials,
                                       Path materialsFile, Problems problems) {
        if (!Files.exists(file)) {
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
