package org.faultbench.benchmarks;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.CRC32;
import java.util.zip.DeflaterOutputStream;

/**
 * Writes an invented scanned-map-like 8-bit grey PNG row by row, so that a 12,000 × 9,000 scan costs one row of
 * memory to make. Layout per the PNG Specification 2nd ed. (W3C 2003): signature, IHDR (bit depth 8, colour type 0,
 * no interlace), IDAT zlib stream of rows each led by filter type 0, IEND; each chunk with a CRC-32 over type and
 * data (from memory). The picture: a light paper tone with faint noise, a 500-pixel grid of dark lines and wavy dark
 * "contour" lines every 60 pixels, so that tiles compress like a real scan rather than like a flat colour.
 */
final class ScanPng {
    private static final byte[] SIGNATURE = { (byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n' };
    private static final int IDAT_CHUNK_BYTES = 1 << 16;

    private ScanPng() {
    }

    static void write(Path file, int width, int height) throws IOException {
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            out.write(SIGNATURE);
            writeChunk(out, "IHDR", header(width, height));
            try (DeflaterOutputStream idat = new DeflaterOutputStream(new IdatChunks(out), true)) {
                byte[] row = new byte[width + 1];
                for (int y = 0; y < height; y++) {
                    for (int x = 0; x < width; x++) {
                        row[x + 1] = (byte) grey(x, y);
                    }
                    idat.write(row);
                }
            }
            writeChunk(out, "IEND", new byte[0]);
        }
    }

    /** Grey value of pixel (x, y): paper, grid lines and contours. */
    static int grey(int x, int y) {
        if (x % 500 < 2 || y % 500 < 2) {
            return 40;
        }
        double wave = y + 25 * Math.sin(x / 300.0) + 10 * Math.sin(x / 47.0 + y / 190.0);
        if (Math.floorMod((int) wave, 60) < 2) {
            return 60;
        }
        int noise = ((x * 73_856_093) ^ (y * 19_349_663)) >>> 28;
        return 225 + noise;
    }

    private static byte[] header(int width, int height) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        DataOutputStream data = new DataOutputStream(bytes);
        data.writeInt(width);
        data.writeInt(height);
        data.write(new byte[] { 8, 0, 0, 0, 0 });
        return bytes.toByteArray();
    }

    private static void writeChunk(OutputStream out, String type, byte[] data) throws IOException {
        DataOutputStream chunk = new DataOutputStream(out);
        byte[] typeBytes = type.getBytes(StandardCharsets.US_ASCII);
        CRC32 crc = new CRC32();
        crc.update(typeBytes);
        crc.update(data);
        chunk.writeInt(data.length);
        chunk.write(typeBytes);
        chunk.write(data);
        chunk.writeInt((int) crc.getValue());
    }

    /** Splits the zlib stream into IDAT chunks as it is written. */
    private static final class IdatChunks extends OutputStream {
        private final OutputStream out;
        private final ByteArrayOutputStream pending = new ByteArrayOutputStream();

        IdatChunks(OutputStream out) {
            this.out = out;
        }

        @Override
        public void write(int b) throws IOException {
            pending.write(b);
            flushFullChunk();
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            pending.write(b, off, len);
            flushFullChunk();
        }

        @Override
        public void close() throws IOException {
            if (pending.size() > 0) {
                writeChunk(out, "IDAT", pending.toByteArray());
                pending.reset();
            }
        }

        private void flushFullChunk() throws IOException {
            if (pending.size() >= IDAT_CHUNK_BYTES) {
                writeChunk(out, "IDAT", pending.toByteArray());
                pending.reset();
            }
        }
    }
}
