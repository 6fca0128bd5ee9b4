/**
 * Reading and writing files at the edge of the tool. Readers, one per file format (kit.json, bars.csv,
 * structures.csv, joints.csv, tube, materials, crate and vehicle catalogs), check every row and collect every
 * problem as {@code FILE:LINE: COLUMN: what is wrong (what was expected)}; {@link kitwright.io.KitReader} assembles
 * a validated {@link kitwright.model.Kit}. {@link kitwright.io.OutputFolder} writes results so that a failed run
 * never leaves half a folder.
 */
package kitwright.io;
