package org.faultbench.digitize.ui.map;

import java.nio.file.Path;
import java.util.Objects;

import org.eclipse.core.runtime.IPath;
import org.eclipse.jface.resource.ImageDescriptor;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IPersistableElement;

/** A map-sheet file or a scanned map image on disk, opened in the map editor. */
public final class MapSheetEditorInput implements IPathEditorInput {
    private final Path file;

    public MapSheetEditorInput(Path file) {
        this.file = Objects.requireNonNull(file, "file").toAbsolutePath().normalize();
    }

    public Path file() {
        return file;
    }

    @Override
    public IPath getPath() {
        return IPath.fromOSString(file.toString());
    }

    @Override
    public boolean exists() {
        return file.toFile().exists();
    }

    @Override
    public ImageDescriptor getImageDescriptor() {
        return ImageDescriptor.getMissingImageDescriptor();
    }

    @Override
    public String getName() {
        return file.getFileName().toString();
    }

    @Override
    public IPersistableElement getPersistable() {
        return null;
    }

    @Override
    public String getToolTipText() {
        return file.toString();
    }

    @Override
    public <T> T getAdapter(Class<T> adapter) {
        return null;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MapSheetEditorInput input && input.file.equals(file);
    }

    @Override
    public int hashCode() {
        return file.hashCode();
    }
}
