package org.faultbench.digitize.importer;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The importers the workbench offers, by id, and which of them read a given file ("which importers read .asc?"). */
public final class ImporterCatalog {

    private final IdRegistry<ImporterType> importers = new IdRegistry<>("importer", ImporterType::name);

    /** The built-in readers, as the bundle's plugin.xml contributes them. */
    public static ImporterCatalog withBuiltIns() {
        ImporterCatalog catalog = new ImporterCatalog();
        BuiltInImporters.TYPES.forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public void register(ImporterType type) {
        importers.register(type == null ? null : type.id(), type);
    }

    public Optional<ImporterType> find(String id) {
        return importers.find(id);
    }

    public List<ImporterType> list() {
        return importers.list();
    }

    public List<String> ids() {
        return importers.ids();
    }

    /** Importers for a file extension ("asc", ".ASC"), in registration order. */
    public List<ImporterType> forExtension(String extension) {
        String wanted = extension.toLowerCase(Locale.ROOT).replaceFirst("^\\.", "");
        return importers.matching(t -> t.extensions().contains(wanted));
    }

    /** Importers whose extensions match the file's name, in registration order. */
    public List<ImporterType> forFile(Path file) {
        return importers.matching(t -> t.reads(file));
    }

    /** Importers producing a kind of data, e.g. every grid reader for an isochore. */
    public List<ImporterType> ofKind(DataKind kind) {
        return importers.matching(t -> t.kind() == kind);
    }
}
