package kitwright.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The files and folders a run reads (kit folders, their files, the catalogs), so that no output of the run can
 * replace or delete one: a result file is never an input, and a result folder never holds an input (replacing it
 * would delete the input with the old result). Paths are compared as the file system resolves them (symbolic links
 * followed, {@code ..} and relative paths made absolute), so another spelling of the same file is caught too.
 */
public record RunInputs(List<Path> paths) {
    public RunInputs {
        paths = paths.stream().filter(Objects::nonNull).map(RunInputs::real).distinct().toList();
    }

    /** The given files (stand-alone runs: {@code --bars}, {@code --stock}, {@code --materials}). */
    public static RunInputs of(Path... files) {
        return new RunInputs(java.util.Arrays.asList(files));
    }

    /** A kit folder, the files in it kitwright reads, and the catalogs its kit.json names or defaults to. */
    public static RunInputs ofKit(Path kitDir) {
        List<Path> paths = new ArrayList<>(List.of(kitDir, kitDir.resolve(KitReader.KIT_JSON),
                kitDir.resolve(KitReader.BARS), kitDir.resolve(KitReader.STRUCTURES), kitDir.resolve(KitReader.JOINTS),
                kitDir.resolve(KitReader.WORKBOOK)));
        KitJson json = KitJsonReader.defaults(kitDir);
        Path kitJson = kitDir.resolve(KitReader.KIT_JSON);
        if (Files.exists(kitJson)) {
            json = KitJsonReader.read(kitJson, kitDir, new Problems()).orElse(json); // read cleanly before
        }
        paths.addAll(List.of(json.stockCatalog(), json.materialsFile(), json.crateCatalogFile(),
                json.vehicleCatalogFile()));
        return new RunInputs(paths);
    }

    /** These inputs and those of {@code other}. */
    public RunInputs and(RunInputs other) {
        List<Path> all = new ArrayList<>(paths);
        all.addAll(other.paths);
        return new RunInputs(all);
    }

    /** Throws when the result folder {@code out} is an input or holds one. */
    public void refuseFolder(Path out) throws InvalidInputException {
        Path target = real(out);
        for (Path input : paths) {
            if (input.startsWith(target) && Files.exists(input)) {
                String what = input.equals(target) ? "this is an input of the run, " : "the folder holds "
                        + input + ", an input of the run, ";
                throw new InvalidInputException(Problem.ofFile(out, what + "which replacing it would delete"
                        + " (expected a folder apart from the kit and its catalogs)"));
            }
        }
    }

    /** Throws when the result file {@code file} is an input. */
    public void refuseFile(Path file) throws InvalidInputException {
        if (paths.contains(real(file))) {
            throw new InvalidInputException(Problem.ofFile(file, "this is an input of the run, which the result"
                    + " would replace (expected a new file name, e.g. plan.json)"));
        }
    }

    /** The path as the file system resolves it: the nearest existing folder's real path, then the rest. */
    static Path real(Path path) {
        Path absolute = path.toAbsolutePath().normalize();
        Path existing = absolute;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return absolute;
        }
        try {
            return existing.toRealPath().resolve(existing.relativize(absolute));
        } catch (IOException e) {
            return absolute;
        }
    }
}
