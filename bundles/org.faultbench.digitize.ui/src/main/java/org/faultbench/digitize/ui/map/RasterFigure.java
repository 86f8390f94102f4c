package org.faultbench.digitize.ui.map;

import java.io.IOException;
import java.util.function.DoubleSupplier;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.graphics.Image;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.raster.PyramidLayout;

/**
 * The scanned map drawn from its image pyramid: at zoom z it picks the level whose pixels are closest to, but not
 * coarser than, a screen pixel (level k = floor(log2(1 / z))), and draws only the tiles that meet the clip.
 * Drawing units are level-0 pixels.
 */
final class RasterFigure extends Figure {
    private final TileImageCache tiles;
    private final DoubleSupplier zoom;
    private String failure = "";

    RasterFigure(TileImageCache tiles, DoubleSupplier zoom) {
        this.tiles = tiles;
        this.zoom = zoom;
        ImagePyramid pyramid = tiles.pyramid();
        setBounds(new Rectangle(0, 0, pyramid.levelWidth(0), pyramid.levelHeight(0)));
        setOpaque(false);
    }

    /** The pyramid level drawn at {@code zoom}. */
    static int levelFor(double zoom, int levelCount) {
        int level = zoom >= 1 ? 0 : (int) Math.floor(Math.log(1 / zoom) / Math.log(2) + 1e-9);
        return Math.max(0, Math.min(levelCount - 1, level));
    }

    /** The last tile read error, "" when all tiles were drawn. */
    String failure() {
        return failure;
    }

    @Override
    protected void paintFigure(Graphics graphics) {
        ImagePyramid pyramid = tiles.pyramid();
        PyramidLayout layout = pyramid.layout();
        int level = levelFor(zoom.getAsDouble(), pyramid.levelCount());
        int scale = 1 << level;
        int span = layout.tileSize() * scale;
        Rectangle clip = graphics.getClip(new Rectangle()).intersect(getBounds());
        if (clip.isEmpty()) {
            return;
        }
        int firstColumn = Math.max(0, clip.x / span);
        int lastColumn = Math.min(layout.tilesAcross(level) - 1, (clip.right() - 1) / span);
        int firstRow = Math.max(0, clip.y / span);
        int lastRow = Math.min(layout.tilesDown(level) - 1, (clip.bottom() - 1) / span);
        for (int row = firstRow; row <= lastRow; row++) {
            for (int column = firstColumn; column <= lastColumn; column++) {
                drawTile(graphics, layout, level, column, row, scale);
            }
        }
    }

    private void drawTile(Graphics graphics, PyramidLayout layout, int level, int column, int row, int scale) {
        try {
            Image image = tiles.image(org.eclipse.swt.widgets.Display.getCurrent(),
                    layout.tileKey(level, column, row));
            int width = layout.tileWidth(level, column);
            int height = layout.tileHeight(level, row);
            int x = column * layout.tileSize() * scale;
            int y = row * layout.tileSize() * scale;
            graphics.drawImage(image, 0, 0, width, height, x, y,
                    Math.min(width * scale, layout.width() - x), Math.min(height * scale, layout.height() - y));
        } catch (IOException unreadable) {
            failure = unreadable.getMessage();
        }
    }
}
