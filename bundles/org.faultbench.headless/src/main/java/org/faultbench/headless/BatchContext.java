package org.faultbench.headless;

import java.io.PrintStream;

/** Where a batch command writes, and which program version it reports. */
record BatchContext(PrintStream out, PrintStream err, String programVersion) {
}
