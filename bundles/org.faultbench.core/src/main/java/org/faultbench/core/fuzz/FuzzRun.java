package org.faultbench.core.fuzz;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * Feeds mutated inputs to one reader and fails on anything but a parse or the reader's documented checked exception:
 * a runtime exception, an error (out of memory from a declared size, stack overflow) or a hang (per-input watchdog).
 * The failure message names the run seed, the input index and the input, so {@code -Dfaultbench.fuzz.seed=S}
 * replays it.
 *
 * <p>Inputs per reader: {@value #CI_ITERATIONS} by default (the CI run; fewer for slow readers), or
 * {@code -Dfaultbench.fuzz.iterations=N} (the long profile {@code -Pfuzz-long} sets 1,000,000).
 *
 * <p>Test support for every bundle that reads files, kept here (like {@code ElementStub}) because bundles' tests
 * cannot see each other's classes; it needs no test library, failures are {@link AssertionError}s.
 */
public final class FuzzRun {
    public static final int CI_ITERATIONS = 3000;
    private static final long WATCHDOG_SECONDS = 20;

    /** The reader under test; it reads the whole input. */
    @FunctionalInterface
    public interface Target {
        void read(byte[] input) throws Exception;
    }

    /** Counts of a finished run. */
    public record Outcome(String reader, int inputs, int parsed, int rejected) {
        @Override
        public String toString() {
            return reader + ": " + inputs + " inputs, " + parsed + " parsed, " + rejected + " rejected";
        }
    }

    private FuzzRun() {
    }

    public static int iterations(int ciIterations) {
        return Integer.getInteger("faultbench.fuzz.iterations", ciIterations);
    }

    public static long seed() {
        return Long.getLong("faultbench.fuzz.seed", 20261202L);
    }

    /** Runs {@value #CI_ITERATIONS} inputs in CI, {@code faultbench.fuzz.iterations} when set. */
    public static Outcome run(String reader, List<byte[]> seeds, Class<? extends Exception> documented,
            Target target) throws InterruptedException {
        return run(reader, CI_ITERATIONS, seeds, documented, target);
    }

    /**
     * Runs {@code ciIterations} inputs (fewer for slow readers, to keep CI short), or
     * {@code faultbench.fuzz.iterations} when set; {@code documented} is the checked exception the reader declares
     * for bad input. The valid seeds themselves must parse (otherwise the fuzzer would test nothing).
     */
    public static Outcome run(String reader, int ciIterations, List<byte[]> seeds,
            Class<? extends Exception> documented, Target target) throws InterruptedException {
        ExecutorService watchdog = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "fuzz " + reader);
            t.setDaemon(true);
            return t;
        });
        try {
            for (byte[] seed : seeds) {
                Throwable problem = attempt(watchdog, target, seed, reader, -1, seed);
                if (problem != null) {
                    throw new AssertionError(reader + ": a valid seed input does not parse: " + problem, problem);
                }
            }
            int inputs = iterations(ciIterations);
            long runSeed = seed();
            int parsed = 0;
            for (int i = 0; i < inputs; i++) {
                SplittableRandom random = new SplittableRandom(runSeed ^ (i * 0x9E3779B97F4A7C15L));
                byte[] input = Mutator.mutate(seeds, random);
                Throwable problem = attempt(watchdog, target, input, reader, i, input);
                if (problem == null) {
                    parsed++;
                } else if (!documented.isInstance(problem)) {
                    throw new AssertionError(describe(reader, runSeed, i, input) + "\nthrew " + stackTrace(problem));
                }
            }
            return new Outcome(reader, inputs, parsed, inputs - parsed);
        } finally {
            watchdog.shutdownNow();
        }
    }

    private static Throwable attempt(ExecutorService watchdog, Target target, byte[] input, String reader, int i,
            byte[] shown) throws InterruptedException {
        Future<Throwable> result = watchdog.submit(() -> {
            try {
                target.read(input);
                return null;
            } catch (Throwable t) {
                return t;
            }
        });
        try {
            return result.get(WATCHDOG_SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            result.cancel(true);
            throw new AssertionError(describe(reader, seed(), i, shown) + "\nhangs (no answer within " + WATCHDOG_SECONDS
                    + " s)");
        } catch (ExecutionException e) {
            return e.getCause();
        }
    }

    private static String describe(String reader, long seed, int i, byte[] input) {
        String text = Mutator.latin1(input);
        String shown = text.length() > 3000 ? text.substring(0, 3000) + "... (" + text.length() + " bytes)" : text;
        return reader + ": fuzz seed " + seed + ", input " + i + ":\n-----\n" + escape(shown) + "\n-----";
    }

    private static String escape(String text) {
        StringBuilder out = new StringBuilder();
        for (char c : text.toCharArray()) {
            out.append(c == '\n' || c == '\t' || (c >= 32 && c < 127) ? String.valueOf(c)
                    : String.format("\\x%02x", (int) c));
        }
        return out.toString();
    }

    private static String stackTrace(Throwable t) {
        StringWriter out = new StringWriter();
        t.printStackTrace(new PrintWriter(out));
        return out.toString();
    }
}
