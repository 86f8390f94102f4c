package org.faultbench.digitize.raster;

/**
 * Progress and cancellation of a pyramid build, in plain Java so the model needs no Eclipse runtime; the workbench
 * adapts its progress monitor to this.
 */
public interface BuildProgress {

    /** Progress that reports nowhere and never cancels. */
    BuildProgress NONE = new BuildProgress() {
        @Override
        public void tilesDone(int done, int total) {
            // nobody is listening
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };

    /** Called after each tile is stored; {@code total} counts the tiles of all levels. */
    void tilesDone(int done, int total);

    /** Polled before each tile; returning true stops the build with a CancellationException. */
    boolean isCancelled();
}
