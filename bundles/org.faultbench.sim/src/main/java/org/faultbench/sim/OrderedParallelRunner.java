package org.faultbench.sim;

import java.util.ArrayDeque;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.SubMonitor;

/**
 * Evaluates realisations in blocks on a pool of threads and hands the blocks to a merger strictly in block order.
 * Together with per-realisation random streams ({@link RealisationRandom}) this makes a run's statistics independent
 * of the thread count. At most {@code 2 × threads} blocks are in flight, so memory does not grow with the number of
 * realisations.
 */
public final class OrderedParallelRunner {
    /** How often the waiting merger looks at the progress monitor for a cancel request. */
    private static final long CANCEL_POLL_MILLIS = 20;

    /** Evaluates realisations {@code first .. first + count - 1}; stops early when {@code cancelled} says so. */
    @FunctionalInterface
    public interface BlockTask<B> {
        B run(int first, int count, BooleanSupplier cancelled);
    }

    /** Receives finished blocks in order, on the calling thread. */
    @FunctionalInterface
    public interface BlockMerger<B> {
        void merge(B block);
    }

    private final int threads;
    private final int blockSize;

    public OrderedParallelRunner(int threads, int blockSize) {
        if (threads < 1 || blockSize < 1) {
            throw new IllegalArgumentException("threads and block size must be positive, were " + threads + ", " + blockSize);
        }
        this.threads = threads;
        this.blockSize = blockSize;
    }

    /**
     * Runs {@code total} realisations.
     *
     * @return true when all realisations ran, false when the monitor cancelled the run (merged blocks stay merged)
     */
    public <B> boolean run(int total, BlockTask<B> task, BlockMerger<B> merger, IProgressMonitor monitor) {
        int blocks = (total + blockSize - 1) / blockSize;
        SubMonitor progress = SubMonitor.convert(monitor, "Running " + total + " realisations", blocks);
        AtomicBoolean cancelled = new AtomicBoolean();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "faultbench-realisations");
            t.setDaemon(true);
            return t;
        });
        ArrayDeque<Future<B>> inFlight = new ArrayDeque<>();
        try {
            int next = 0;
            for (int merged = 0; merged < blocks; merged++) {
                while (next < blocks && inFlight.size() < 2 * threads) {
                    int first = next * blockSize;
                    int count = Math.min(blockSize, total - first);
                    inFlight.add(pool.submit(() -> task.run(first, count, cancelled::get)));
                    next++;
                }
                B block = await(inFlight.poll(), progress, cancelled);
                if (block == null) {
                    return false;
                }
                merger.merge(block);
                progress.worked(1);
            }
            return true;
        } finally {
            cancelled.set(true);
            pool.shutdownNow();
        }
    }

    private static <B> B await(Future<B> future, IProgressMonitor monitor, AtomicBoolean cancelled) {
        while (true) {
            if (monitor.isCanceled()) {
                cancelled.set(true);
                return null;
            }
            try {
                return future.get(CANCEL_POLL_MILLIS, TimeUnit.MILLISECONDS);
            } catch (TimeoutException e) {
                // poll the monitor again
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                cancelled.set(true);
                return null;
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException runtime) {
                    throw runtime;
                }
                throw new IllegalStateException("realisation failed: " + cause, cause);
            }
        }
    }
}
