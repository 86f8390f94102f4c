package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class RasterFormatTest {

    @Test
    void imageIoReaderNamesMapToFormats() {
        // names reported by ImageReader.getFormatName() of the JDK 17 plugins (observed; common practice)
        assertEquals(Optional.of(RasterFormat.PNG), RasterFormat.ofImageIoName("png"));
        assertEquals(Optional.of(RasterFormat.JPEG), RasterFormat.ofImageIoName("JPEG"));
        assertEquals(Optional.of(RasterFormat.TIFF), RasterFormat.ofImageIoName("tif"));
        assertEquals(Optional.of(RasterFormat.BMP), RasterFormat.ofImageIoName("bmp"));
        assertEquals(Optional.empty(), RasterFormat.ofImageIoName("gif"));
    }

    @Test
    void genericWldIsTriedLast() {
        // ESRI world file naming (from memory)
        assertEquals(List.of("tfw", "tifw", "tiffw", "wld"), RasterFormat.TIFF.worldFileExtensions());
    }
}
