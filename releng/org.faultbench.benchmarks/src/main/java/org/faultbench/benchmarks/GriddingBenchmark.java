package org.faultbench.benchmarks;

import java.util.concurrent.TimeUnit;

import org.faultbench.digitize.gridding.GriddingInput;
import org.faultbench.digitize.gridding.GriddingResult;
import org.faultbench.digitize.gridding.MinimumCurvatureGridder;
import org.faultbench.digitize.gridding.SurfaceGridder;
import org.faultbench.digitize.gridding.TinGridder;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The gridding target of the map workflow: about 100,000 contour vertices of {@link FaultedDome} gridded to
 * 1000 × 1000 nodes with its {@value FaultedDome#FAULT_COUNT} fault traces as barriers, by TIN and by minimum
 * curvature. Each operation is one complete {@link SurfaceGridder#grid} call as the workbench makes it (mesh or
 * iteration, fault handling and the residual report); building the contours is set-up and not timed.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class GriddingBenchmark {

    /** The gridding methods of {@code org.faultbench.digitize.gridding}. */
    public enum Method {
        TIN, MIN_CURVATURE
    }

    @Param
    public Method method;

    private GriddingInput input;
    private SurfaceGridder gridder;

    @Setup(Level.Trial)
    public void contourTheDome() {
        input = FaultedDome.input();
        gridder = method == Method.TIN ? new TinGridder() : new MinimumCurvatureGridder();
    }

    @Benchmark
    public GriddingResult grid() {
        return gridder.grid(input);
    }
}
