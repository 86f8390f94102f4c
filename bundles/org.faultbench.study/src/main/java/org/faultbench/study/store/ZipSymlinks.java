package org.faultbench.study.store;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.HashSet;
import java.util.Set;

/**
 * Names of the entries a zip marks as Unix symbolic links. {@link java.util.zip.ZipFile} does not expose the
 * attributes that say so, so they are read from the central directory (PKWARE APPNOTE.TXT 4.3.12: "version made by"
 * high byte 3 = Unix, external attributes high 16 bits = the Unix mode, S_IFLNK = 0120000).
 */
final class ZipSymlinks {
    private static final int CENTRAL_HEADER = 0x02014b50;
    private static final int END_OF_CENTRAL_DIRECTORY = 0x06054b50;
    private static final int UNIX = 3;
    private static final int FILE_TYPE_MASK = 0170000;
    private static final int SYMLINK = 0120000;

    private ZipSymlinks() {
    }

    static Set<String> find(Path zip) throws IOException {
        Set<String> links = new HashSet<>();
        try (FileChannel channel = FileChannel.open(zip, StandardOpenOption.READ)) {
            long size = channel.size();
            int tail = (int) Math.min(size, 22 + 65_535);
            ByteBuffer end = read(channel, size - tail, tail);
            int eocd = -1;
            for (int k = tail - 22; k >= 0; k--) {
                if (end.getInt(k) == END_OF_CENTRAL_DIRECTORY) {
                    eocd = k;
                    break;
                }
            }
            if (eocd < 0) {
                return links; // ZipFile reports the damage
            }
            long directorySize = Integer.toUnsignedLong(end.getInt(eocd + 12));
            long directoryStart = Integer.toUnsignedLong(end.getInt(eocd + 16));
            if (directoryStart + directorySize > size || directorySize > Integer.MAX_VALUE) {
                return links;
            }
            ByteBuffer dir = read(channel, directoryStart, (int) directorySize);
            int at = 0;
            while (at + 46 <= dir.limit() && dir.getInt(at) == CENTRAL_HEADER) {
                int madeBy = Short.toUnsignedInt(dir.getShort(at + 4)) >> 8;
                int nameLength = Short.toUnsignedInt(dir.getShort(at + 28));
                int extraLength = Short.toUnsignedInt(dir.getShort(at + 30));
                int commentLength = Short.toUnsignedInt(dir.getShort(at + 32));
                int mode = dir.getInt(at + 38) >>> 16;
                if (at + 46 + nameLength > dir.limit()) {
                    break;
                }
                if (madeBy == UNIX && (mode & FILE_TYPE_MASK) == SYMLINK) {
                    byte[] name = new byte[nameLength];
                    dir.get(at + 46, name);
                    links.add(new String(name, StandardCharsets.UTF_8));
                }
                at += 46 + nameLength + extraLength + commentLength;
            }
        }
        return links;
    }

    private static ByteBuffer read(FileChannel channel, long position, int length) throws IOException {
        ByteBuffer buffer = ByteBuffer.allocate(length).order(ByteOrder.LITTLE_ENDIAN);
        while (buffer.hasRemaining() && channel.read(buffer, position + buffer.position()) >= 0) {
            // keep reading
        }
        return buffer.flip();
    }
}
