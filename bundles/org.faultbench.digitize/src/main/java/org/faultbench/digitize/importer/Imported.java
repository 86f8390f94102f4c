package org.faultbench.digitize.importer;

import java.util.List;
import java.util.Objects;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.io.XyzPoints;
import org.faultbench.digitize.las.LasLog;
import org.faultbench.digitize.vector.VectorFeature;

/** The content of an imported file, one record per {@link DataKind}, so callers switch on a closed set. */
public sealed interface Imported {

    DataKind kind();

    record Grid(RegularGrid grid) implements Imported {
        public Grid {
            Objects.requireNonNull(grid, "grid");
        }

        @Override
        public DataKind kind() {
            return DataKind.GRID;
        }
    }

    record Points(XyzPoints points) implements Imported {
        public Points {
            Objects.requireNonNull(points, "points");
        }

        @Override
        public DataKind kind() {
            return DataKind.POINTS;
        }
    }

    record Lines(List<VectorFeature> features) implements Imported {
        public Lines {
            features = List.copyOf(features);
        }

        @Override
        public DataKind kind() {
            return DataKind.LINES;
        }
    }

    record Tops(List<WellTop> tops) implements Imported {
        public Tops {
            tops = List.copyOf(tops);
        }

        @Override
        public DataKind kind() {
            return DataKind.TOPS;
        }
    }

    record Log(LasLog log) implements Imported {
        public Log {
            Objects.requireNonNull(log, "log");
        }

        @Override
        public DataKind kind() {
            return DataKind.LOG;
        }
    }
}
