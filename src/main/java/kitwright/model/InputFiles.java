package kitwright.model;

import java.nio.file.Path;

/**
 * The catalog files a kit was read with besides its tube catalog (which {@link TubeCatalog#file()} names), so that
 * a report can list every input: each null when none was read.
 *
 * @param materials the materials catalog
 * @param crates    the crate catalog
 * @param vehicles  the vehicle catalog
 */
public record InputFiles(Path materials, Path crates, Path vehicles) {
    /** No catalog files besides the tube catalog. */
    public static final InputFiles NONE = new InputFiles(null, null, null);
}
