package org.faultbench.study;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes an edited study back to its analysis file: the new text goes to a temporary file beside it, is forced to
 * disk and renamed over the old file in one step, so a crash leaves either the old or the new file, never half of
 * one; the previous version is kept as {@code <name>.bak}.
 */
public final class AnalysisFileSaver {

    /** Saves {@code analysis} and returns it as read back from the saved file (same content, fresh hash). */
    public AnalysisFile save(AnalysisFile analysis) throws IOException, StudyFormatException {
        Path file = analysis.file().toAbsolutePath();
        byte[] content = StudyEdits.content(analysis);
        Path temp = file.resolveSibling(file.getFileName() + ".saving");
        try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            channel.write(java.nio.ByteBuffer.wrap(content));
            channel.force(true);
        }
        if (Files.exists(file)) {
            Files.copy(file, file.resolveSibling(file.getFileName() + ".bak"), StandardCopyOption.REPLACE_EXISTING);
        }
        Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        return new AnalysisFileReader().read(file);
    }
}
