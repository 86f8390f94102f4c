package org.faultbench.study;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.Map;
import java.util.stream.Stream;

/**
 * Writes a set of output files into a folder all or nothing: every file is written into a hidden staging folder
 * beside the target first, and only when all are written are they moved in, each by an atomic rename. A failure part
 * way leaves the target as it was.
 */
public final class StagedOutput {

    private StagedOutput() {
    }

    /**
     * @param outDir the target folder, created when missing
     * @param files file names (no folders) and their content, moved in in this map's order
     */
    public static void write(Path outDir, Map<String, byte[]> files) throws IOException {
        Path absolute = outDir.toAbsolutePath();
        Files.createDirectories(absolute.getParent());
        Path staging = Files.createTempDirectory(absolute.getParent(), ".faultbench-out-");
        try {
            for (Map.Entry<String, byte[]> file : files.entrySet()) {
                Files.write(staging.resolve(file.getKey()), file.getValue());
            }
            Files.createDirectories(absolute);
            for (String name : files.keySet()) {
                Files.move(staging.resolve(name), absolute.resolve(name), StandardCopyOption.REPLACE_EXISTING,
                        StandardCopyOption.ATOMIC_MOVE);
            }
        } finally {
            deleteQuietly(staging);
        }
    }

    private static void deleteQuietly(Path dir) {
        try (Stream<Path> walk = Files.walk(dir)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (IOException | UncheckedIOException e) {
            // the staging folder is hidden and temporary; leaving it behind is harmless
        }
    }
}
