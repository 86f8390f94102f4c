package org.faultbench.study.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.Enumeration;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipException;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

/**
 * Exports a workspace folder to a zip and imports one safely, to hand a study to a colleague.
 *
 * <p>Import is all-or-nothing: the archive is extracted into a hidden temporary folder beside the target, which is
 * renamed to the target only when every entry was extracted. An archive is refused, and nothing is left behind, when
 * an entry would land outside the target (a {@code ..} component, an absolute path, a drive letter or a backslash),
 * when it holds a symbolic link or the same name twice, or when it exceeds the {@link ArchiveLimits} (entry count and
 * bytes actually extracted, so a zip bomb stops at the limit).
 */
public final class StudyArchive {
    private final ArchiveLimits limits;

    public StudyArchive(ArchiveLimits limits) {
        this.limits = limits;
    }

    public StudyArchive() {
        this(ArchiveLimits.DEFAULT);
    }

    /**
     * Writes every regular file under {@code workspace} (symbolic links and the store's temporary files are left
     * out) to {@code zip}, atomically: the zip appears complete or not at all.
     */
    public void export(Path workspace, Path zip) throws IOException {
        Path temporary = AtomicFileStore.sibling(zip, AtomicFileStore.TEMPORARY);
        List<Path> files;
        try (Stream<Path> walk = Files.walk(workspace)) {
            files = walk.filter(f -> Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS))
                    .filter(f -> !f.getFileName().toString().endsWith(AtomicFileStore.TEMPORARY))
                    .filter(f -> !f.toAbsolutePath().equals(zip.toAbsolutePath())
                            && !f.toAbsolutePath().equals(temporary.toAbsolutePath()))
                    .sorted().toList();
        }
        AtomicFileStore.replaceStreamed(zip, out -> {
            ZipOutputStream zipOut = new ZipOutputStream(out);
            for (Path file : files) {
                zipOut.putNextEntry(new ZipEntry(workspace.relativize(file).toString().replace('\\', '/')));
                Files.copy(file, zipOut);
                zipOut.closeEntry();
            }
            zipOut.finish();
        });
    }

    /**
     * Extracts {@code zip} into {@code target}, which must not exist yet (or be an empty folder).
     *
     * @return the number of files extracted
     * @throws IOException naming the archive and the offending entry; the target is then unchanged
     */
    public int importArchive(Path zip, Path target) throws IOException {
        Path absoluteTarget = target.toAbsolutePath().normalize();
        if (Files.isDirectory(absoluteTarget)) {
            try (Stream<Path> content = Files.list(absoluteTarget)) {
                if (content.findAny().isPresent()) {
                    throw new DirectoryNotEmptyException(absoluteTarget + ": import needs a new or empty folder");
                }
            }
        } else if (Files.exists(absoluteTarget, LinkOption.NOFOLLOW_LINKS)) {
            throw new FileAlreadyExistsException(absoluteTarget + ": exists and is not a folder");
        }
        Path parent = absoluteTarget.getParent();
        Files.createDirectories(parent);
        Path staging = Files.createTempDirectory(parent, "." + absoluteTarget.getFileName() + ".import-");
        try {
            int files = extract(zip, staging);
            Files.deleteIfExists(absoluteTarget);
            Files.move(staging, absoluteTarget, StandardCopyOption.ATOMIC_MOVE);
            return files;
        } finally {
            deleteTree(staging);
        }
    }

    private int extract(Path zip, Path staging) throws IOException {
        String name = zip.getFileName().toString();
        Set<String> links = ZipSymlinks.find(zip);
        Set<String> seen = new HashSet<>();
        long total = 0;
        int entries = 0;
        int files = 0;
        try (ZipFile archive = new ZipFile(zip.toFile())) {
            Enumeration<? extends ZipEntry> all = archive.entries();
            while (all.hasMoreElements()) {
                ZipEntry entry = all.nextElement();
                String entryName = entry.getName();
                if (++entries > limits.maxEntries()) {
                    throw new IOException(name + ": more than " + limits.maxEntries() + " entries; refused");
                }
                if (links.contains(entryName)) {
                    throw new IOException(name + ": entry " + entryName + " is a symbolic link; refused");
                }
                Path destination = destination(name, staging, entryName);
                if (!seen.add(destination.toString())) {
                    throw new IOException(name + ": entry " + entryName + " appears twice; refused");
                }
                if (entry.isDirectory()) {
                    Files.createDirectories(destination);
                    continue;
                }
                Files.createDirectories(destination.getParent());
                try (InputStream in = archive.getInputStream(entry);
                        OutputStream out = Files.newOutputStream(destination)) {
                    total = copyWithin(in, out, total, name, entryName);
                }
                files++;
            }
        } catch (ZipException e) {
            throw new IOException(name + ": not a readable zip archive: " + e.getMessage(), e);
        }
        return files;
    }

    /** Where {@code entryName} goes inside {@code staging}; refuses names that leave it. */
    private static Path destination(String zipName, Path staging, String entryName) throws IOException {
        if (entryName.isEmpty() || entryName.startsWith("/") || entryName.contains("\\") || entryName.contains(":")
                || entryName.indexOf('\0') >= 0) {
            throw new IOException(zipName + ": entry '" + entryName + "' has an absolute or foreign path; refused");
        }
        for (String part : entryName.split("/")) {
            if (part.equals("..")) {
                throw new IOException(zipName + ": entry '" + entryName + "' leads outside the target folder; refused");
            }
        }
        Path destination = staging.resolve(entryName).normalize();
        if (!destination.startsWith(staging) || destination.equals(staging)) {
            throw new IOException(zipName + ": entry '" + entryName + "' leads outside the target folder; refused");
        }
        return destination;
    }

    private long copyWithin(InputStream in, OutputStream out, long total, String zipName, String entryName)
            throws IOException {
        byte[] buffer = new byte[64 * 1024];
        long sum = total;
        for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
            sum += n;
            if (sum > limits.maxTotalBytes()) {
                throw new IOException(zipName + ": extracts to more than " + limits.maxTotalBytes()
                        + " bytes (at entry " + entryName + "); refused as a possible zip bomb");
            }
            out.write(buffer, 0, n);
        }
        return sum;
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
