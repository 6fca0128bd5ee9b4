package kitwright.io;

import java.nio.file.Path;
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
 */
public record KitJson(KitSettings settings, Path stockCatalog, Path materials, Path crateCatalog,
                      Path vehicleCatalog, CsvConvention csv) {
    public KitJson {
        csv = csv == null ? CsvConvention.DETECTED : csv;
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
