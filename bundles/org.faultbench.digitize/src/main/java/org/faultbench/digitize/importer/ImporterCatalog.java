package org.faultbench.digitize.importer;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/** The importers the workbench offers, by id, and which of them read a given file ("which importers read .asc?"). */
public final class ImporterCatalog {

    private final Map<String, ImporterType> importers = new LinkedHashMap<>();

    /** The built-in readers, as the bundle's plugin.xml contributes them. */
    public static ImporterCatalog withBuiltIns() {
        ImporterCatalog catalog = new ImporterCatalog();
        BuiltInImporters.TYPES.forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public synchronized void register(ImporterType type) {
        if (importers.containsKey(type.id())) {
            throw new IllegalArgumentException("importer id '" + type.id() + "' is already registered by "
                    + importers.get(type.id()).name());
        }
        importers.put(type.id(), type);
    }

    public synchronized Optional<ImporterType> find(String id) {
        return Optional.ofNullable(importers.get(id));
    }

    public synchronized List<ImporterType> list() {
        return List.copyOf(importers.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(importers.keySet());
    }

    /** Importers for a file extension ("asc", ".ASC"), in registration order. */
    public synchronized List<ImporterType> forExtension(String extension) {
        String wanted = extension.toLowerCase(Locale.ROOT).replaceFirst("^\\.", "");
        return importers.values().stream().filter(t -> t.extensions().contains(wanted)).toList();
    }

    /** Importers whose extensions match the file's name, in registration order. */
    public synchronized List<ImporterType> forFile(Path file) {
        return importers.values().stream().filter(t -> t.reads(file)).toList();
    }

    /** Importers producing a kind of data, e.g. every grid reader for an isochore. */
    public synchronized List<ImporterType> ofKind(DataKind kind) {
        return importers.values().stream().filter(t -> t.kind() == kind).toList();
    }
}
