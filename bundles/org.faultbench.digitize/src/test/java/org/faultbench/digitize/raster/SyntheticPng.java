package org.faultbench.digitize.raster;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.IntBinaryOperator;
import java.util.zip.CRC32;
import java.util.zip.DeflaterOutputStream;

/**
 * Writes 8-bit grey PNG files row by row without ImageIO, so test scans of any size cost a row of memory, and the
 * pyramid's reading is checked against an encoder that is not the one it decodes with. Layout per the PNG
 * Specification 2nd ed. (W3C 2003): signature, IHDR (width, height, bit depth 8, colour type 0, compression 0,
 * filter 0, interlace 0), IDAT zlib stream of rows each led by filter type 0, IEND; each chunk CRC-32 over type and
 * data (from memory).
 */
final class SyntheticPng {
    private static final byte[] SIGNATURE = { (byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n' };
    private static final int IDAT_CHUNK_BYTES = 1 << 16;

    private SyntheticPng() {
    }

    /** A grey PNG whose pixel (x, y) has the grey value {@code grey.applyAsInt(x, y) & 0xFF}. */
    static void writeGrey(Path file, int width, int height, IntBinaryOperator grey) throws IOException {
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file))) {
            out.write(SIGNATURE);
            writeChunk(out, "IHDR", header(width, height));
            try (DeflaterOutputStream idat = new DeflaterOutputStream(new IdatChunks(out), true)) {
                byte[] row = new byte[width + 1];
                for (int y = 0; y < height; y++) {
                    for (int x = 0; x < width; x++) {
                        row[x + 1] = (byte) grey.applyAsInt(x, y);
                    }
                    idat.write(row);
                }
            }
            writeChunk(out, "IEND", new byte[0]);
        }
    }

    /** A PNG with a header claiming width × height pixels and no pixel data at all. */
    static void writeHeaderOnly(Path file, int width, int height) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            out.write(SIGNATURE);
            writeChunk(out, "IHDR", header(width, height));
            writeChunk(out, "IEND", new byte[0]);
        }
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
