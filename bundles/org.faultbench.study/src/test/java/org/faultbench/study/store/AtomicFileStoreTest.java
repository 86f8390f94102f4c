package org.faultbench.study.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFileStoreTest {
    /** A toy format: complete files end with "END". */
    private static final ContentCheck ENDS_WITH_END = content -> {
        if (!new String(content, StandardCharsets.UTF_8).endsWith("END")) {
            throw new IOException("no END marker");
        }
    };

    @TempDir
    Path dir;

    private final AtomicFileStore store = new AtomicFileStore();

    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private String read(Path file) throws IOException {
        return Files.readString(file);
    }

    @Test
    void secondSaveKeepsThePreviousVersionAsBackupAndLeavesNoTemporaryFile() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        assertFalse(Files.exists(dir.resolve("p.json.bak")), "no backup before there was a previous version");
        store.save(file, bytes("v2 END"));
        assertEquals("v2 END", read(file));
        assertEquals("v1 END", read(dir.resolve("p.json.bak")));
        assertFalse(Files.exists(dir.resolve("p.json.tmp")));
        assertFalse(Files.exists(dir.resolve("p.json.bak.tmp")));
    }

    @Test
    void backupIsIndependentOfTheNewFile() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        store.save(file, bytes("v2 END"));
        store.save(file, bytes("v3 END"));
        assertEquals("v2 END", read(dir.resolve("p.json.bak")), "hard link must not follow the renamed file");
    }

    @Test
    void cleanOpenReportsNothing() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        StoredContent opened = store.open(file, ENDS_WITH_END);
        assertArrayEquals(bytes("v1 END"), opened.content());
        assertFalse(opened.report().recovered());
        assertTrue(opened.report().notes().isEmpty());
    }

    @Test
    void leftoverPartialTemporaryIsDiscardedWhenTheMainFileIsValid() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        Files.writeString(dir.resolve("p.json.tmp"), "v2 EN");
        StoredContent opened = store.open(file, ENDS_WITH_END);
        assertArrayEquals(bytes("v1 END"), opened.content());
        assertFalse(opened.report().recovered());
        assertEquals(1, opened.report().notes().size());
        assertFalse(Files.exists(dir.resolve("p.json.tmp")));
    }

    @Test
    void damagedMainFileIsRestoredFromBackupAndKeptAside() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        store.save(file, bytes("v2 END"));
        Files.writeString(file, "v2 truncat");
        StoredContent opened = store.open(file, ENDS_WITH_END);
        assertEquals(RecoveryAction.RESTORED_FROM_BACKUP, opened.report().action());
        assertEquals("v1 END", read(file));
        assertEquals("v2 truncat", read(dir.resolve("p.json.damaged")));
        assertTrue(opened.report().summary().contains("no END marker"), opened.report().summary());
    }

    @Test
    void missingMainFileIsRestoredFromACompleteTemporaryBeforeTheOlderBackup() throws IOException {
        Path file = dir.resolve("p.json");
        store.save(file, bytes("v1 END"));
        store.save(file, bytes("v2 END"));
        Files.writeString(dir.resolve("p.json.tmp"), "v3 END");
        Files.delete(file);
        StoredContent opened = store.open(file, ENDS_WITH_END);
        assertEquals(RecoveryAction.RESTORED_FROM_TEMPORARY, opened.report().action());
        assertEquals("v3 END", read(file));
        assertFalse(Files.exists(dir.resolve("p.json.tmp")));
    }

    @Test
    void noValidVersionIsAnErrorNamingTheFileAndEachCandidate() throws IOException {
        Path file = dir.resolve("p.json");
        Files.writeString(file, "garbage");
        IOException e = assertThrows(IOException.class, () -> store.open(file, ENDS_WITH_END));
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("backup is missing"), e.getMessage());
        assertEquals("garbage", read(file), "an unrecoverable file is left as found");
    }

    @Test
    void streamedContentReplacesTheFileWholeOrNotAtAll() throws IOException {
        Path file = dir.resolve("archive.zip");
        Files.writeString(file, "old");
        AtomicFileStore.replaceStreamed(file, out -> out.write("new".getBytes(StandardCharsets.UTF_8)));
        assertEquals("new", Files.readString(file));
        IOException e = assertThrows(IOException.class, () -> AtomicFileStore.replaceStreamed(file, out -> {
            out.write("half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("disk full", e.getMessage());
        assertEquals("new", Files.readString(file), "a failed write leaves the previous file");
        assertFalse(Files.exists(AtomicFileStore.sibling(file, AtomicFileStore.TEMPORARY)), "and no temporary file");
    }
}
