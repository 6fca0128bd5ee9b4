/**
 * The solver's native libraries: OR-Tools ships them inside its jar, and they must be on disk before the JVM can
 * load them. {@link kitwright.natives.SolverLibraries#load()} is the one way kitwright loads them: unpacked once
 * per OR-Tools version and platform into a per-user cache ({@link kitwright.natives.NativeCache}), never into the
 * temporary folder, and leftovers of earlier runs that did use the temporary folder are removed on start
 * ({@link kitwright.natives.StaleCopies}). Like {@code io/}, this package touches files; it is infrastructure,
 * not a planning stage.
 */
package kitwright.natives;
