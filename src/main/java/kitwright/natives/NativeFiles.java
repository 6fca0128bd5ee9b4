package kitwright.natives;

import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.Properties;
import java.util.TreeMap;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

/**
 * The OR-Tools native files for one platform as the class path holds them: the folder {@code ortools-<platform>/}
 * of the {@code ortools-<platform>} jar (or of kitwright's jar, which bundles it), the same folder
 * {@code com.google.ortools.Loader} unpacks. Knows the files' names and sizes, the OR-Tools version from the jar's
 * Maven {@code pom.properties}, and copies the files into a folder.
 */
record NativeFiles(String platform, String version, Map<String, Long> sizes, URL source) {
    NativeFiles {
        sizes = Map.copyOf(sizes);
    }

    /** The files for {@code platform} (JNA's resource prefix, as OR-Tools' Loader uses it), read from the class path. */
    static NativeFiles find(String platform) throws IOException {
        ClassLoader loader = NativeFiles.class.getClassLoader();
        String folder = folder(platform);
        URL url = loader.getResource(folder);
        if (url == null) {
            throw new IOException("the OR-Tools native libraries for " + platform + " (" + folder
                    + ") are not on the class path");
        }
        Map<String, Long> sizes = new TreeMap<>();
        if ("jar".equals(url.getProtocol())) {
            try (ZipFile zip = new ZipFile(jarPath(url).toFile())) {
                zip.stream().filter(e -> !e.isDirectory() && e.getName().startsWith(folder))
                        .forEach(e -> sizes.put(e.getName().substring(folder.length()), e.getSize()));
            }
        } else {
            Path dir = path(url);
            try (Stream<Path> files = Files.list(dir)) {
                for (Path f : (Iterable<Path>) files.filter(Files::isRegularFile)::iterator) {
                    sizes.put(f.getFileName().toString(), Files.size(f));
                }
            }
        }
        if (sizes.isEmpty()) {
            throw new IOException("no OR-Tools native libraries in " + url);
        }
        return new NativeFiles(platform, version(loader, platform, sizes), sizes, url);
    }

    /** The cache folder's name: one per OR-Tools version and platform. */
    String cacheName() {
        return "ortools-" + version + "-" + platform;
    }

    /** True when {@code dir} holds every file with its size (a complete copy). */
    boolean isCompleteIn(Path dir) {
        for (Map.Entry<String, Long> e : sizes.entrySet()) {
            Path f = dir.resolve(e.getKey());
            try {
                if (!Files.isRegularFile(f) || Files.size(f) != e.getValue()) {
                    return false;
                }
            } catch (IOException ex) {
                return false;
            }
        }
        return true;
    }

    /** Copies every file into {@code dir}, which exists and is empty. */
    void copyTo(Path dir) throws IOException {
        String folder = folder(platform);
        if ("jar".equals(source.getProtocol())) {
            try (ZipFile zip = new ZipFile(jarPath(source).toFile())) {
                for (String name : sizes.keySet()) {
                    ZipEntry entry = zip.getEntry(folder + name);
                    try (InputStream in = zip.getInputStream(entry)) {
                        Files.copy(in, dir.resolve(name));
                    }
                }
            }
        } else {
            Path from = path(source);
            for (String name : sizes.keySet()) {
                Files.copy(from.resolve(name), dir.resolve(name));
            }
        }
    }

    private static String folder(String platform) {
        return "ortools-" + platform + "/";
    }

    /**
     * The version in {@code META-INF/maven/com.google.ortools/ortools-<platform>/pom.properties}; when a repackaged
     * jar dropped it, a digest of the file names and sizes, so that different libraries never share a cache folder.
     */
    private static String version(ClassLoader loader, String platform, Map<String, Long> sizes) throws IOException {
        String properties = "META-INF/maven/com.google.ortools/ortools-" + platform + "/pom.properties";
        try (InputStream in = loader.getResourceAsStream(properties)) {
            if (in != null) {
                Properties p = new Properties();
                p.load(in);
                String v = p.getProperty("version", "").trim();
                if (v.matches("[0-9A-Za-z._-]+")) {
                    return v;
                }
            }
        }
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            sizes.forEach((name, size) -> digest.update((name + "\t" + size + "\n").getBytes(
                    java.nio.charset.StandardCharsets.UTF_8)));
            return "files-" + HexFormat.of().formatHex(digest.digest()).substring(0, 12);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    private static Path jarPath(URL url) throws IOException {
        return path(((JarURLConnection) url.openConnection()).getJarFileURL());
    }

    private static Path path(URL url) throws IOException {
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException | IllegalArgumentException e) {
            throw new IOException("cannot read " + url + ": " + e.getMessage(), e);
        }
    }
}
