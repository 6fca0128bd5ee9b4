package kitwright.io;

import java.nio.file.Path;
import java.util.List;
import kitwright.model.KitSettings;

/**
 * What {@code kit.json} says: the planning settings and where the catalogs are. A catalog that kit.json does not
 * name defaults to a file beside the tube catalog, which may be absent; a named one must exist.
 *
 * @param stockCatalog   the tube catalog (default {@code stock.csv} in the kit folder)
 * @param materials      the materials file kit.json names, or null
 * @param crateCatalog   the crate catalog kit.json names, or null
 * @param vehicleCatalog the vehicle catalog kit.json names, or null
 * @param csv            the delimiter and decimal sign kit.json states for bars.csv, structures.csv and joints.csv
 * @param tour           the names of {@code tour} with the kit.json line of each (the names are also in
 *                       {@code settings.tour()}), so that a name structures.csv lacks is reported on its line
 */
public record KitJson(KitSettings settings, Path stockCatalog, Path materials, Path crateCatalog,
                      Path vehicleCatalog, CsvConvention csv, List<Sourced<String>> tour) {
    public KitJson {
        csv = csv == null ? CsvConvention.DETECTED : csv;
        tour = tour == null ? List.of() : List.copyOf(tour);
    }

    /** Settings without a tour. */
    public KitJson(KitSettings settings, Path stockCatalog, Path materials, Path crateCatalog, Path vehicleCatalog,
                   CsvConvention csv) {
        this(settings, stockCatalog, materials, crateCatalog, vehicleCatalog, csv, List.of());
    }

    /** The materials file: the named one, or {@code materials.csv} beside the tube catalog. */
    public Path materialsFile() {
        return materials != null ? materials : stockCatalog.resolveSibling("materials.csv");
    }

    /** The crate catalog: the named one, or {@code crates.csv} beside the tube catalog. */
    public Path crateCatalogFile() {
        return crateCatalog != null ? crateCatalog : stockCatalog.resolveSibling("crates.csv");
    }

    /** The vehicle catalog: the named one, or {@code vehicles.csv} beside the tube catalog. */
    public Path vehicleCatalogFile() {
        return vehicleCatalog != null ? vehicleCatalog : stockCatalog.resolveSibling("vehicles.csv");
    }
}
