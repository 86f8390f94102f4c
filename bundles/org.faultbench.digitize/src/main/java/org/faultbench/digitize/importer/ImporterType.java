package org.faultbench.digitize.importer;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * A registered importer with what the catalog needs to offer it: the file extensions it reads and the kind of data
 * it produces.
 *
 * @param extensions lower-case, without the dot, e.g. ["asc", "grd"]
 */
public record ImporterType(String id, String name, List<String> extensions, DataKind kind, Importer importer) {

    public ImporterType {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("importer id is missing");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("importer '" + id + "' has no name");
        }
        extensions = List.copyOf(extensions);
        if (extensions.isEmpty()) {
            throw new IllegalArgumentException("importer '" + id + "' names no file extension");
        }
        for (String extension : extensions) {
            if (!extension.matches("[a-z0-9_]+")) {
                throw new IllegalArgumentException("importer '" + id + "': file extension '" + extension
                        + "' must be lower-case letters and digits without the dot, e.g. 'asc'");
            }
        }
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(importer, "importer");
    }

    /** Whether the file name ends with one of the extensions, ignoring case. */
    public boolean reads(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        int dot = name.lastIndexOf('.');
        return dot >= 0 && extensions.contains(name.substring(dot + 1));
    }

    /**
     * Reads the file and checks that the importer kept its word on the data kind.
     *
     * @throws IOException when the file cannot be read or is not in the format, or the importer returned another
     *         kind of data than it declared
     */
    public Imported read(Path file, ImportSettings settings) throws IOException {
        Imported imported = importer.read(file, settings);
        if (imported == null || imported.kind() != kind) {
            throw new IOException(file.getFileName() + ": importer '" + name + "' (" + id + ") returned "
                    + (imported == null ? "nothing" : imported.kind().name().toLowerCase(Locale.ROOT))
                    + " instead of " + kind.name().toLowerCase(Locale.ROOT));
        }
        return imported;
    }
}
