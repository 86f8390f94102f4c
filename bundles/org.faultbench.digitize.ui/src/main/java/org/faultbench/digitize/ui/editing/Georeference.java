package org.faultbench.digitize.ui.editing;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.FitReport;
import org.faultbench.digitize.georef.TransformFitter;
import org.faultbench.digitize.georef.TransformKind;

/**
 * The control points of one scan and the transform kind chosen for them, refitted with {@link TransformFitter} on
 * every change, so the editor draws with the current fit and the residual table shows the current residuals. When
 * the points cannot fix the transform, the reason is kept for the user and the scan falls back to pixel units.
 * Not thread-safe: change it from the UI thread.
 */
public final class Georeference {
    /** Told after the points or the kind changed and the fit was redone. */
    @FunctionalInterface
    public interface Listener {
        void georeferenceChanged(Georeference georeference);
    }

    private final List<ControlPoint> points = new ArrayList<>();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private TransformKind kind;
    private Optional<FitReport> fit = Optional.empty();
    private String problem = "";

    public Georeference(TransformKind kind, List<ControlPoint> points) {
        this.kind = Objects.requireNonNull(kind, "transform kind");
        for (ControlPoint point : points) {
            requireNewId(point.id());
            this.points.add(point);
        }
        refit();
    }

    public List<ControlPoint> points() {
        return List.copyOf(points);
    }

    public TransformKind kind() {
        return kind;
    }

    /** The fit of the enabled points; empty when they cannot fix the transform (see {@link #problem()}). */
    public Optional<FitReport> fit() {
        return fit;
    }

    /** Why there is no fit, worded for the user; "" when there is one. */
    public String problem() {
        return problem;
    }

    /** The projection the editor draws with: the fit when there is one, scan pixels otherwise. */
    public ScanProjection projection() {
        return fit.<ScanProjection>map(report -> new FittedProjection(report.transform()))
                .orElseGet(PixelProjection::new);
    }

    public Optional<ControlPoint> find(String id) {
        return points.stream().filter(p -> p.id().equals(id)).findFirst();
    }

    /** An id not used yet: CP1, CP2, ... */
    public String nextId() {
        int n = points.size() + 1;
        while (find("CP" + n).isPresent()) {
            n++;
        }
        return "CP" + n;
    }

    public void setKind(TransformKind newKind) {
        kind = Objects.requireNonNull(newKind, "transform kind");
        refit();
    }

    /** Adds {@code point} at {@code index} (0 to the number of points). */
    public void add(int index, ControlPoint point) {
        requireNewId(point.id());
        points.add(index, point);
        refit();
    }

    /** Removes the point with {@code id}; returns its index. */
    public int remove(String id) {
        int index = indexOf(id);
        points.remove(index);
        refit();
        return index;
    }

    /** Puts {@code point} in place of the point with the same id. */
    public void replace(ControlPoint point) {
        points.set(indexOf(point.id()), point);
        refit();
    }

    public int indexOf(String id) {
        for (int i = 0; i < points.size(); i++) {
            if (points.get(i).id().equals(id)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no control point '" + id + "'");
    }

    public void addListener(Listener listener) {
        listeners.add(Objects.requireNonNull(listener, "listener"));
    }

    public void removeListener(Listener listener) {
        listeners.remove(listener);
    }

    private void requireNewId(String id) {
        if (find(id).isPresent()) {
            throw new IllegalArgumentException("control point id '" + id + "' is used more than once");
        }
    }

    private void refit() {
        try {
            fit = Optional.of(TransformFitter.fit(kind, points));
            problem = "";
        } catch (IllegalArgumentException cannotFit) {
            fit = Optional.empty();
            problem = cannotFit.getMessage();
        }
        for (Listener listener : listeners) {
            listener.georeferenceChanged(this);
        }
    }
}
