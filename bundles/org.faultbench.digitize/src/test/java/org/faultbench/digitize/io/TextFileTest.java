package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TextFileTest {
    @TempDir
    Path dir;

    @Test
    void byteOrderMarkOfSpreadsheetExportsIsDropped() throws IOException {
        Path file = dir.resolve("tops.csv");
        byte[] mark = { (byte) 0xEF, (byte) 0xBB, (byte) 0xBF };
        byte[] text = "Well,Surface\r\nW-1,Top\r\n".getBytes(StandardCharsets.UTF_8);
        byte[] all = new byte[mark.length + text.length];
        System.arraycopy(mark, 0, all, 0, mark.length);
        System.arraycopy(text, 0, all, mark.length, text.length);
        Files.write(file, all);
        TextFile read = TextFile.read(file);
        assertEquals("tops.csv", read.name());
        assertEquals(2, read.lineCount());
        assertEquals("Well,Surface", read.line(1));
    }

    @Test
    void bytesThatAreNotUtf8AreReadAsLatin1() throws IOException {
        Path file = dir.resolve("latin1.csv");
        Files.write(file, "R\u00e9-1".getBytes(StandardCharsets.ISO_8859_1));
        assertEquals("R\u00e9-1", TextFile.read(file).line(1));
    }

    @Test
    void numberErrorsPointAtLineAndField() throws IOException {
        TextFile file = TextFile.read(new StringReader("a b\n"), "pts.xyz");
        FormatException e = assertThrows(FormatException.class, () -> file.number("", 1, 2, "y"));
        assertEquals("pts.xyz, line 1, field 2: expected a number for y, found an empty field", e.getMessage());
        FormatException small = assertThrows(FormatException.class, () -> file.count("1", 3, 2, "ncols", 2));
        assertEquals("pts.xyz, line 3, field 2: ncols must be at least 2, found 1", small.getMessage());
    }
}
