package kitwright.model;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A validated kit: settings, marks, structures, joints and the catalogs they refer to. Every bar's section is in
 * the tube catalog; every section's material is in {@code materials} when materials were given.
 *
 * @param dir       the kit folder (null for stand-alone runs from loose files)
 * @param materials materials by name; empty when no materials file was given (masses are then unknown)
 * @param crates    crate catalog, empty when none was found
 * @param vehicles  vehicle catalog, empty when none was found
 * @param files     the other catalog files read (for the report's inputs)
 */
public record Kit(Path dir, KitSettings settings, List<Bar> bars, List<StructureCount> structures,
                  List<Joint> joints, TubeCatalog catalog, Map<String, Material> materials,
                  List<CrateType> crates, List<VehicleType> vehicles, InputFiles files) {

    /** A kit whose other catalog files are not known (built in memory). */
    public Kit(Path dir, KitSettings settings, List<Bar> bars, List<StructureCount> structures, List<Joint> joints,
               TubeCatalog catalog, Map<String, Material> materials, List<CrateType> crates,
               List<VehicleType> vehicles) {
        this(dir, settings, bars, structures, joints, catalog, materials, crates, vehicles, InputFiles.NONE);
    }

    public Kit {
        files = files == null ? InputFiles.NONE : files;
        bars = List.copyOf(bars);
        structures = List.copyOf(structures);
        joints = List.copyOf(joints);
        materials = Map.copyOf(materials);
        crates = List.copyOf(crates);
        vehicles = List.copyOf(vehicles);
    }

    public String name() {
        return settings.name();
    }

    public Section section(Bar bar) {
        return catalog.section(bar.section()).orElseThrow();
    }

    /** The rows of structures.csv that count bars (joint rows left out), in file order. */
    public List<StructureCount> barCounts() {
        return structures.stream().filter(c -> bar(c.mark()).isPresent()).toList();
    }

    public Optional<Bar> bar(String mark) {
        return bars.stream().filter(b -> b.mark().equals(mark)).findFirst();
    }

    /** The material of a section, when materials are known. */
    public Optional<Material> material(Section section) {
        return Optional.ofNullable(materials.get(section.material()));
    }

    /**
     * Pieces of a mark cut beyond its quantity for saw errors (kit.json {@code miscutAllowance}): part of the
     * cutting demand, bundled, crated and weighed with the kit; service-life spares come on top.
     */
    public int allowance(Bar bar) {
        return settings.miscutAllowance().piecesFor(bar.quantity());
    }

    /** Mass of one bar of a mark, when its material is known. */
    public Optional<Double> barMassKg(Bar bar) {
        Section s = section(bar);
        return material(s).map(m -> s.massPerMetreKg(m.densityKgM3()) * bar.lengthMm() / 1000.0);
    }

    /** Sections the bars use, in catalog order. */
    public List<String> usedSections() {
        return catalog.sections().keySet().stream()
                .filter(s -> bars.stream().anyMatch(b -> b.section().equals(s)))
                .toList();
    }

    /** Copy with other settings (command-line overrides). */
    public Kit withSettings(KitSettings other) {
        return new Kit(dir, other, bars, structures, joints, catalog, materials, crates, vehicles, files);
    }
}
