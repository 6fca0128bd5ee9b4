package kitwright.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * The marker file {@value #NAME} that kitwright writes into each result folder: a header line naming kitwright and
 * its version, then the folder's files one per line (relative, '/'-separated). A folder is kitwright's, and may be
 * replaced, only when its marker is a regular file that starts with that header and every other entry of the folder
 * is one of the files it lists. An empty marker, a folder of that name, a marker of another program or a file the
 * user added all stop the run, so a mistyped {@code --out} never wipes a folder of the user's.
 */
final class OutputMarker {
    static final String NAME = ".kitwright-output";
    static final String HEADER = "# kitwright output folder";
    /** Largest marker read; a real one lists a few dozen names. */
    private static final int MAX_BYTES = 1 << 20;
    /** Unknown entries named in the message; the walk stops after as many. */
    private static final int SHOWN = 5;

    private OutputMarker() {
    }

    /** The marker's text for a folder holding {@code files} (relative names, '/'-separated). */
    static String text(Set<String> files) {
        StringBuilder sb = new StringBuilder(HEADER).append(", written by kitwright ")
                .append(KitwrightVersion.current()).append('\n')
                .append("# The next kitwright run into this folder replaces the files listed below; it stops if it"
                        + " finds any other file here. Keep your own files elsewhere.\n");
        files.forEach(name -> sb.append(name).append('\n'));
        return sb.toString();
    }

    /** Every regular file under {@code folder} except the marker, relative and '/'-separated, sorted. */
    static Set<String> files(Path folder) throws IOException {
        Set<String> names = new TreeSet<>();
        try (var walk = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                if (Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    String name = relative(folder, p);
                    if (!name.equals(NAME)) {
                        names.add(name);
                    }
                }
            }
        }
        return names;
    }

    /** The files a kitwright marker in {@code folder} lists, or empty when there is no marker kitwright wrote. */
    static Optional<Set<String>> listed(Path folder) throws IOException {
        Path marker = folder.resolve(NAME);
        if (!Files.isRegularFile(marker, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.empty();
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(marker, LinkOption.NOFOLLOW_LINKS)) {
            bytes = in.readNBytes(MAX_BYTES + 1);
        }
        String text = new String(bytes, StandardCharsets.UTF_8);
        if (bytes.length > MAX_BYTES || !text.startsWith(HEADER)) {
            return Optional.empty();
        }
        Set<String> names = new TreeSet<>();
        text.lines().filter(line -> !line.isBlank() && !line.startsWith("#")).forEach(names::add);
        return Optional.of(names);
    }

    /**
     * Why {@code folder} (an existing folder) may not be replaced, or empty when it may: it is empty, or it holds a
     * kitwright marker and nothing but the files the marker lists.
     */
    static Optional<String> refusal(Path folder) throws IOException {
        try (var entries = Files.list(folder)) {
            if (entries.findAny().isEmpty()) {
                return Optional.empty();
            }
        }
        Optional<Set<String>> listed = listed(folder);
        if (listed.isEmpty()) {
            String why = Files.exists(folder.resolve(NAME), LinkOption.NOFOLLOW_LINKS)
                    ? "the folder exists and its " + NAME + " is not a marker kitwright wrote"
                    : "the folder exists and was not written by kitwright";
            return Optional.of(why);
        }
        List<String> unknown = unknownEntries(folder, listed.get());
        if (unknown.isEmpty()) {
            return Optional.empty();
        }
        String shown = String.join(", ", unknown.subList(0, Math.min(SHOWN, unknown.size())))
                + (unknown.size() > SHOWN ? " and more" : "");
        return Optional.of("the folder holds files kitwright did not write: " + shown + "; they would be deleted"
                + " with it");
    }

    /** Entries not listed by the marker (files, links, folders holding no listed file), at most SHOWN + 1. */
    private static List<String> unknownEntries(Path folder, Set<String> listed) throws IOException {
        List<String> unknown = new ArrayList<>();
        Files.walkFileTree(folder, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attributes) {
                String name = relative(folder, dir);
                if (!dir.equals(folder) && listed.stream().noneMatch(f -> f.startsWith(name + "/"))) {
                    unknown.add(name + "/");
                    return stopWhenEnough(unknown);
                }
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attributes) {
                String name = relative(folder, file);
                if (!name.equals(NAME) && (!attributes.isRegularFile() || !listed.contains(name))) {
                    unknown.add(name);
                }
                return stopWhenEnough(unknown);
            }
        });
        return unknown;
    }

    private static FileVisitResult stopWhenEnough(List<String> unknown) {
        return unknown.size() > SHOWN ? FileVisitResult.TERMINATE : FileVisitResult.SKIP_SUBTREE;
    }

    private static String relative(Path folder, Path entry) {
        return folder.relativize(entry).toString().replace(entry.getFileSystem().getSeparator(), "/");
    }
}
