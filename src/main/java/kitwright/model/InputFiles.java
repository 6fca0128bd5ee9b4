package kitwright.model;

import java.nio.file.Path;
import java.util.List;

/**
 * The catalog files a kit was read with besides its tube catalog (which {@link TubeCatalog#file()} names), and the
 * workbook its tables came from, so that a report can list every input: each null when none was read.
 *
 * @param materials the materials catalog
 * @param crates    the crate catalog
 * @param vehicles  the vehicle catalog
 * @param workbook  kit.xlsx when the kit's tables are its sheets, null when they are CSV files
 * @param sheets    the sheets of the workbook read (bars, and structures and joints when present), as spelt there
 */
public record InputFiles(Path materials, Path crates, Path vehicles, Path workbook, List<String> sheets) {
    /** No catalog files besides the tube catalog. */
    public static final InputFiles NONE = new InputFiles(null, null, null);

    public InputFiles {
        sheets = sheets == null ? List.of() : List.copyOf(sheets);
    }

    /** Catalog files of a kit whose tables are CSV files. */
    public InputFiles(Path materials, Path crates, Path vehicles) {
        this(materials, crates, vehicles, null, List.of());
    }
}
