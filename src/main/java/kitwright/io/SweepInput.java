package kitwright.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import kitwright.model.Joint;
import kitwright.model.Material;
import kitwright.model.Section;
import kitwright.model.TubeCatalog;
import kitwright.sweep.Member;

/**
 * What {@code sweep} reads from KIT_DIR: kit.json (settings and catalog paths), the tube catalog, the optional
 * joints.csv and members.csv, each checked as {@link KitReader} checks a kit's files (the materials, crate and
 * vehicle catalogs too), every problem collected before anything is thrown.
 *
 * @param kitDir   the designer's folder
 * @param kitJson  kit.json as read (defaults without one)
 * @param catalog  the tube catalog
 * @param joints   the joints, empty without joints.csv
 * @param members  every member in file order
 */
public record SweepInput(Path kitDir, KitJson kitJson, TubeCatalog catalog, List<Joint> joints,
                         List<Member> members) {
    public SweepInput {
        joints = List.copyOf(joints);
        members = List.copyOf(members);
    }

    /** Reads and checks KIT_DIR; throws with every problem found. */
    public static SweepInput read(Path kitDir) throws InvalidInputException {
        if (!Files.isDirectory(kitDir)) {
            String wrong = Files.exists(kitDir) ? "this is a file, not a folder" : "folder not found";
            throw new InvalidInputException(Problem.ofFile(kitDir, wrong
                    + " (expected a folder holding kit.json and members.csv)"));
        }
        Problems problems = new Problems();
        Path kitJsonFile = kitDir.resolve(KitReader.KIT_JSON);
        KitJson kitJson = KitJsonReader.defaults(kitDir);
        if (KitReader.present(kitJsonFile)) {
            kitJson = KitJsonReader.read(kitJsonFile, kitDir, problems).orElse(null);
            if (kitJson == null) {
                problems.throwIfAny();
            }
        }
        Map<String, Material> materials = KitReader.materials(kitJson.materialsFile(), kitJson.materials() != null,
                problems);
        boolean named = !kitJson.stockCatalog().equals(KitJsonReader.defaults(kitDir).stockCatalog());
        TubeCatalog catalog = KitReader.catalog(kitJson.stockCatalog(), named, materials, kitJson.materialsFile(),
                problems);
        if (kitJson.crateCatalog() != null || KitReader.present(kitJson.crateCatalogFile())) {
            CrateCatalogReader.read(kitJson.crateCatalogFile(), problems);
        }
        if (kitJson.vehicleCatalog() != null || KitReader.present(kitJson.vehicleCatalogFile())) {
            VehicleCatalogReader.read(kitJson.vehicleCatalogFile(), problems);
        }
        Path jointsFile = kitDir.resolve(KitReader.JOINTS);
        List<Joint> joints = KitReader.present(jointsFile)
                ? JointsReader.read(jointsFile, kitJson.settings().jointBox(), problems) : List.of();
        Path membersFile = kitDir.resolve(MembersReader.FILE);
        List<Member> members = MembersReader.read(membersFile, kitJson.settings(), catalog, problems);
        problems.throwIfAny();
        return new SweepInput(kitDir, kitJson, catalog, joints, members);
    }

    /** The members' sections, widest first (then by name): the order their mark letters follow. */
    public List<String> sectionOrder() {
        return members.stream().map(Member::section).distinct()
                .sorted(Comparator.comparingDouble((String s) -> -catalog.section(s).map(Section::outerDiameterMm)
                        .orElse(0.0)).thenComparing(Comparator.naturalOrder()))
                .toList();
    }

    /** The files the run reads, so that no output replaces one. */
    public RunInputs inputs() {
        return new RunInputs(List.of(kitDir, kitDir.resolve(KitReader.KIT_JSON), kitDir.resolve(MembersReader.FILE),
                kitDir.resolve(KitReader.JOINTS), kitJson.stockCatalog(), kitJson.materialsFile(),
                kitJson.crateCatalogFile(), kitJson.vehicleCatalogFile()));
    }
}
