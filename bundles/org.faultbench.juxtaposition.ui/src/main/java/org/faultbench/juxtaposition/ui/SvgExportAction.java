package org.faultbench.juxtaposition.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.svg.AllanSvgFrame;
import org.faultbench.juxtaposition.svg.AllanSvgWriter;
import org.faultbench.juxtaposition.svg.SvgDepthLine;

/**
 * Saves the Allan diagram on show as SVG, a vector figure for reports and slides, drawn from the same picture (walls,
 * extent, depth lines) as the canvas.
 */
final class SvgExportAction extends Action {
    private final AllanDiagramView view;

    SvgExportAction(AllanDiagramView view) {
        super("Export SVG...");
        setToolTipText("Save the Allan diagram as an SVG vector figure");
        this.view = view;
    }

    @Override
    public void run() {
        AllanPicture picture = view.picture();
        Shell shell = view.getSite().getShell();
        if (picture == null) {
            MessageDialog.openInformation(shell, "Export SVG", "Open a study first: there is no Allan diagram to export.");
            return;
        }
        FileDialog dialog = new FileDialog(shell, SWT.SAVE);
        dialog.setFilterExtensions(new String[] { "*.svg" });
        dialog.setFileName("allan-" + picture.faultId + ".svg");
        dialog.setOverwrite(true);
        String file = dialog.open();
        if (file == null) {
            return;
        }
        try {
            export(picture, view.depthLines(), Path.of(file));
        } catch (IOException e) {
            MessageDialog.openError(shell, "Export SVG", "Could not write " + file + ": " + e.getMessage());
        }
    }

    /** Writes {@code picture} with its depth lines to {@code file}. */
    static void export(AllanPicture picture, List<AllanCanvas.DepthLine> lines, Path file) throws IOException {
        HungColumns walls = new HungColumns(picture.column, picture.column, picture.referenceUnit);
        AllanDiagram diagram = AllanDiagram.of(picture.columns, walls);
        AllanSvgFrame frame = new AllanSvgFrame(picture.uMin(), picture.uMax(), picture.zTop(), picture.zBase());
        List<SvgDepthLine> svgLines = new ArrayList<>();
        for (AllanCanvas.DepthLine line : lines) {
            RGB c = line.colour();
            svgLines.add(new SvgDepthLine(line.label(), line.z(), (c.red << 16) | (c.green << 8) | c.blue,
                    line.style() != SWT.LINE_SOLID));
        }
        new AllanSvgWriter(diagram, picture.faultId, frame).write(file, svgLines);
    }
}
