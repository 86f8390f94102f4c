package org.faultbench.study.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StudyArchiveTest {
    @TempDir
    Path dir;

    /** A zip with the given entries (name, content); a null content makes a folder entry. */
    private static byte[] zip(String... namesAndContents) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream out = new ZipOutputStream(bytes)) {
            for (int k = 0; k < namesAndContents.length; k += 2) {
                out.putNextEntry(new ZipEntry(namesAndContents[k]));
                if (namesAndContents[k + 1] != null) {
                    out.write(namesAndContents[k + 1].getBytes(StandardCharsets.UTF_8));
                }
                out.closeEntry();
            }
        }
        return bytes.toByteArray();
    }

    private Path write(String name, byte[] content) throws IOException {
        return Files.write(dir.resolve(name), content);
    }

    /** The refused import leaves neither the target nor a staging folder behind. */
    private void assertRefusedCleanly(Path zip, String expected) throws IOException {
        Path target = dir.resolve("imported");
        IOException e = assertThrows(IOException.class, () -> new StudyArchive(new ArchiveLimits(10, 1 << 20))
                .importArchive(zip, target));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
        assertTrue(e.getMessage().startsWith(zip.getFileName().toString()), e.getMessage());
        assertFalse(Files.exists(target));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(zip), left.toList(), "no staging folder may remain");
        }
        assertFalse(Files.exists(dir.getParent().resolve("evil.txt")));
    }

    @Test
    void exportedWorkspaceImportsIdentically() throws IOException {
        Path workspace = Files.createDirectories(dir.resolve("ws/studies"));
        Files.writeString(workspace.resolve("s.json"), "{\"a\": 1}");
        Files.writeString(dir.resolve("ws/faultbench-project.json"), "{}");
        Files.writeString(dir.resolve("ws/faultbench-project.json.tmp"), "unfinished");
        Path zip = dir.resolve("ws.zip");
        new StudyArchive().export(dir.resolve("ws"), zip);
        Path target = dir.resolve("copy");
        assertEquals(2, new StudyArchive().importArchive(zip, target));
        assertEquals("{\"a\": 1}", Files.readString(target.resolve("studies/s.json")));
        assertFalse(Files.exists(target.resolve("faultbench-project.json.tmp")), "temporary files are not exported");
    }

    @Test
    void parentDirectoryTraversalIsRefused() throws IOException {
        assertRefusedCleanly(write("a.zip", zip("ok.txt", "fine", "../evil.txt", "x")), "outside the target");
    }

    @Test
    void traversalHiddenInsideAPathIsRefused() throws IOException {
        assertRefusedCleanly(write("b.zip", zip("studies/", null, "studies/../../evil.txt", "x")),
                "outside the target");
    }

    @Test
    void absoluteAndWindowsPathsAreRefused() throws IOException {
        assertRefusedCleanly(write("c.zip", zip("/tmp/evil.txt", "x")), "absolute");
        Files.delete(dir.resolve("c.zip"));
        assertRefusedCleanly(write("d.zip", zip("C:\\evil.txt", "x")), "absolute");
        Files.delete(dir.resolve("d.zip"));
        assertRefusedCleanly(write("e.zip", zip("..\\evil.txt", "x")), "absolute");
    }

    @Test
    void symbolicLinkEntryIsRefused() throws IOException {
        // a link entry as Info-ZIP writes it: made by Unix (3), mode 0120777, content = the link's target
        byte[] bytes = zip("ok.txt", "fine", "link", "/etc");
        markAsSymlink(bytes, "link");
        assertRefusedCleanly(write("f.zip", bytes), "symbolic link");
    }

    @Test
    void zipBombStopsAtTheByteLimit() throws IOException {
        String zeros = "0".repeat(3 << 20); // 3 MiB compressing to a few kB; limit 1 MiB
        Path zip = write("g.zip", zip("big.txt", zeros));
        assertTrue(Files.size(zip) < 100_000);
        assertRefusedCleanly(zip, "zip bomb");
    }

    @Test
    void tooManyEntriesAreRefused() throws IOException {
        String[] entries = new String[2 * 11];
        for (int k = 0; k < 11; k++) {
            entries[2 * k] = "f" + k + ".txt";
            entries[2 * k + 1] = "x";
        }
        assertRefusedCleanly(write("h.zip", zip(entries)), "more than 10 entries");
    }

    @Test
    void damagedArchiveIsRefused() throws IOException {
        assertRefusedCleanly(write("i.zip", "PK not really a zip".getBytes(StandardCharsets.UTF_8)),
                "not a readable zip");
    }

    @Test
    void nonEmptyTargetIsRefused() throws IOException {
        Path zip = write("j.zip", zip("ok.txt", "fine"));
        Path target = Files.createDirectories(dir.resolve("full"));
        Files.writeString(target.resolve("keep.txt"), "mine");
        assertThrows(IOException.class, () -> new StudyArchive().importArchive(zip, target));
        assertEquals("mine", Files.readString(target.resolve("keep.txt")));
    }

    /** Sets "version made by" to Unix and the external attributes to a symlink mode in the central directory. */
    private static void markAsSymlink(byte[] zip, String entryName) {
        ByteBuffer b = ByteBuffer.wrap(zip).order(ByteOrder.LITTLE_ENDIAN);
        byte[] name = entryName.getBytes(StandardCharsets.UTF_8);
        for (int at = 0; at + 46 + name.length <= zip.length; at++) {
            if (b.getInt(at) == 0x02014b50 && b.getShort(at + 28) == name.length
                    && new String(zip, at + 46, name.length, StandardCharsets.UTF_8).equals(entryName)) {
                b.putShort(at + 4, (short) ((3 << 8) | 20));
                b.putInt(at + 38, 0120777 << 16);
                return;
            }
        }
        throw new IllegalStateException("entry " + entryName + " not found");
    }
}
