package org.faultbench.study.store;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;

/**
 * Saves files so that a crash, a kill or a power cut at any instant loses at most the save in progress, and opens
 * them with recovery.
 *
 * <p>A save of {@code name} runs in this order:
 * <ol>
 * <li>the new content is written to {@code name.tmp} in the same folder and forced to disk
 * ({@link FileChannel#force(boolean) force(true)});</li>
 * <li>if {@code name} exists, it is hard-linked (copied and forced where links are not supported) to
 * {@code name.bak.tmp}, which is then renamed atomically to {@code name.bak}: the backup is always a complete
 * earlier version;</li>
 * <li>{@code name.tmp} is renamed to {@code name} with {@link StandardCopyOption#ATOMIC_MOVE}, replacing the old
 * file in one step;</li>
 * <li>the folder is forced to disk so the renames survive a power cut (where the platform allows opening a folder;
 * on Windows this step is skipped).</li>
 * </ol>
 * Guarantee: at every instant {@code name} holds either the previous or the new complete content (once it has been
 * saved once), and {@code name.bak} holds a complete earlier version. When {@link #save} returns, the new content is
 * on disk. Saves of the same file must not run concurrently (one writer per file); the class keeps no state.
 *
 * <p>{@link #open} checks the main file with the caller's {@link ContentCheck}. If it is missing or fails the check
 * (damaged by something outside this class, e.g. another program or a failing disk), the complete temporary file
 * of an interrupted save, or else the backup, is restored in its place, the damaged file is kept as
 * {@code name.damaged}, and the returned {@link RecoveryReport} says what was done.
 */
public final class AtomicFileStore {
    static final String TEMPORARY = ".tmp";
    static final String BACKUP = ".bak";
    static final String BACKUP_STAGING = ".bak.tmp";
    static final String DAMAGED = ".damaged";

    /** Saves {@code content} as {@code file}, keeping the previous content as {@code file.bak}. */
    public void save(Path file, byte[] content) throws IOException {
        Path temporary = sibling(file, TEMPORARY);
        writeAndForce(temporary, content);
        if (Files.exists(file)) {
            keepBackup(file);
        }
        atomicRename(temporary, file);
        forceFolder(file);
    }

    /**
     * Opens {@code file}, restoring the newest valid version if the main file is missing or fails {@code check}.
     *
     * @throws IOException naming the file and what was wrong with each candidate when no valid version exists
     */
    public StoredContent open(Path file, ContentCheck check) throws IOException {
        List<String> notes = new ArrayList<>();
        Path staging = sibling(file, BACKUP_STAGING);
        if (Files.deleteIfExists(staging)) {
            notes.add("An unfinished backup copy was discarded.");
        }
        Path temporary = sibling(file, TEMPORARY);
        Candidate main = Candidate.read(file, check);
        if (main.valid()) {
            if (Files.deleteIfExists(temporary)) {
                notes.add("The temporary file of an interrupted save was discarded; the file holds the last"
                        + " completed save.");
            }
            return new StoredContent(main.content(), new RecoveryReport(file, RecoveryAction.NONE, notes));
        }
        notes.add("The file " + main.problem() + ".");
        Candidate saving = Candidate.read(temporary, check);
        if (saving.valid()) {
            setAsideDamaged(file, notes);
            atomicRename(temporary, file);
            forceFolder(file);
            return new StoredContent(saving.content(),
                    new RecoveryReport(file, RecoveryAction.RESTORED_FROM_TEMPORARY, notes));
        }
        Path backupFile = sibling(file, BACKUP);
        Candidate backup = Candidate.read(backupFile, check);
        if (backup.valid()) {
            setAsideDamaged(file, notes);
            Files.deleteIfExists(temporary);
            Path copy = sibling(file, TEMPORARY);
            writeAndForce(copy, backup.content());
            atomicRename(copy, file);
            forceFolder(file);
            return new StoredContent(backup.content(), new RecoveryReport(file, RecoveryAction.RESTORED_FROM_BACKUP,
                    notes));
        }
        throw new IOException(file + ": no valid version found: the file " + main.problem() + "; the temporary file "
                + saving.problem() + "; the backup " + backup.problem());
    }

    /**
     * One version of the file as read: its content when it passes the check (the very bytes returned to the caller,
     * so a file changed after the check is never handed out unchecked), else what is wrong with it.
     */
    private record Candidate(byte[] content, String problem) {

        static Candidate read(Path candidate, ContentCheck check) {
            byte[] content;
            try {
                content = Files.readAllBytes(candidate);
            } catch (NoSuchFileException e) {
                return new Candidate(null, "is missing");
            } catch (IOException e) {
                return new Candidate(null, "cannot be read (" + e.getMessage() + ")");
            }
            try {
                check.check(content);
                return new Candidate(content, null);
            } catch (Exception e) {
                return new Candidate(null, "is damaged (" + e.getMessage() + ")");
            }
        }

        boolean valid() {
            return problem == null;
        }
    }

    private static void setAsideDamaged(Path file, List<String> notes) throws IOException {
        if (Files.exists(file)) {
            Path damaged = sibling(file, DAMAGED);
            Files.move(file, damaged, StandardCopyOption.REPLACE_EXISTING);
            notes.add("The damaged file was kept as " + damaged.getFileName() + ".");
        }
    }

    private static void keepBackup(Path file) throws IOException {
        Path staging = sibling(file, BACKUP_STAGING);
        Files.deleteIfExists(staging);
        try {
            Files.createLink(staging, file);
        } catch (UnsupportedOperationException | FileSystemException e) {
            writeAndForce(staging, Files.readAllBytes(file));
        }
        atomicRename(staging, sibling(file, BACKUP));
    }

    /** Writes content too large to hold in memory (e.g. a zip archive) to a stream. */
    @FunctionalInterface
    interface StreamedContent {
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * Replaces {@code file} by what {@code content} writes, with the same guarantees as a save (temporary file forced
     * to disk, atomic rename, folder forced) but no backup: the file appears complete or not at all.
     */
    static void replaceStreamed(Path file, StreamedContent content) throws IOException {
        Path temporary = sibling(file, TEMPORARY);
        try {
            writeAndForce(temporary, content);
        } catch (IOException | RuntimeException failed) {
            Files.deleteIfExists(temporary);
            throw failed;
        }
        atomicRename(temporary, file);
        forceFolder(file);
    }

    private static void writeAndForce(Path target, byte[] content) throws IOException {
        writeAndForce(target, out -> out.write(content));
    }

    /** Writes {@code target} from scratch and forces it to disk before returning. */
    private static void writeAndForce(Path target, StreamedContent content) throws IOException {
        try (FileChannel channel = FileChannel.open(target, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            OutputStream out = Channels.newOutputStream(channel);
            content.writeTo(out);
            out.flush();
            channel.force(true);
        }
    }

    private static void atomicRename(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            throw new IOException(to + ": the file system cannot replace files atomically, so it cannot be saved"
                    + " safely here; choose a folder on a local disk", e);
        }
    }

    /** Forces the folder entry changes (renames) to disk; not possible on every platform, then skipped. */
    private static void forceFolder(Path file) {
        Path folder = file.toAbsolutePath().getParent();
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Windows cannot open a folder as a channel; its renames are journalled by NTFS.
        }
    }

    static Path sibling(Path file, String suffix) {
        return file.resolveSibling(file.getFileName() + suffix);
    }
}
