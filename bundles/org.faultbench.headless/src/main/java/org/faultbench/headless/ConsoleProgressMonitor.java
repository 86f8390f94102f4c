package org.faultbench.headless;

import java.io.PrintStream;

import org.eclipse.core.runtime.NullProgressMonitor;

/** Prints progress of a batch run as whole percentages, at most every 10 %. */
final class ConsoleProgressMonitor extends NullProgressMonitor {
    private final PrintStream out;
    private double total;
    private double done;
    private int lastPrinted = -10;

    ConsoleProgressMonitor(PrintStream out) {
        this.out = out;
    }

    @Override
    public void beginTask(String name, int totalWork) {
        total = totalWork;
        out.println(name);
    }

    @Override
    public void subTask(String name) {
        out.println("  " + name);
    }

    @Override
    public void internalWorked(double work) {
        done += work;
        int percent = total <= 0 ? 0 : (int) Math.floor(100 * done / total);
        if (percent >= lastPrinted + 10) {
            lastPrinted = percent - percent % 10;
            out.println("  " + lastPrinted + " %");
        }
    }

    @Override
    public void worked(int work) {
        internalWorked(work);
    }
}
