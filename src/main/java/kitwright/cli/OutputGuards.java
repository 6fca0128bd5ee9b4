package kitwright.cli;

import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import kitwright.cutting.CutPlan;
import kitwright.io.InvalidInputException;
import kitwright.io.OutputFile;
import kitwright.io.OutputFolder;
import kitwright.io.Problem;
import kitwright.io.RunInputs;
import kitwright.nesting.NestPlan;

/**
 * The checks every command makes on {@code --out DIR} and {@code --json FILE} before it plans: neither is an input
 * of the run, the folder holds no input, and an existing file is replaced only when kitwright wrote it (one of the
 * JSON documents of {@code cut}, {@code nest} or {@code pack}) or {@code --force} is given.
 */
final class OutputGuards {
    /** The top-level keys of each document {@code --json} writes: the cutting plan, the nesting plan, logistics. */
    static final List<Set<String>> JSON_DOCUMENTS = List.of(keys(CutPlan.class), keys(NestPlan.class),
            Set.of("crates", "loads"));

    private OutputGuards() {
    }

    static void checkFolder(Path out, RunInputs inputs) throws InvalidInputException, IOException {
        OutputFolder.check(out);
        inputs.refuseFolder(out);
    }

    static void checkJson(Path json, Path out, RunInputs inputs, boolean force)
            throws InvalidInputException, IOException {
        OutputFile.check(json);
        inputs.refuseFile(json);
        if (out != null && json.toAbsolutePath().normalize().startsWith(out.toAbsolutePath().normalize())) {
            throw new InvalidInputException(Problem.ofFile(json, "the file lies inside --out " + out + ", which"
                    + " is replaced whole (expected a file outside that folder)"));
        }
        OutputFile.checkReplaceable(json, JSON_DOCUMENTS, force);
    }

    /** Checks again (the file may have appeared while planning), then writes the file whole. */
    static void writeJson(Path json, String text, RunInputs inputs, boolean force)
            throws InvalidInputException, IOException {
        checkJson(json, null, inputs, force);
        OutputFile.write(json, text);
    }

    private static Set<String> keys(Class<? extends Record> type) {
        return Arrays.stream(type.getRecordComponents()).map(RecordComponent::getName).collect(Collectors.toSet());
    }
}
