package org.faultbench.headless;

import java.io.PrintStream;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;

/**
 * Batch entry point, started from the product with {@code -application org.faultbench.headless.batch}.
 * Loads no workbench and no SWT; the process exit code is the one {@link BatchCommand} returns.
 */
public class HeadlessApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        // report images are drawn into memory with java.awt; never open a display for that
        System.setProperty("java.awt.headless", "true");
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        context.applicationRunning();
        return Integer.valueOf(run(args == null ? new String[0] : args, System.out, System.err));
    }

    static int run(String[] args, PrintStream out, PrintStream err) {
        return BatchCommand.parse(args).execute(new BatchContext(out, err, programVersion()));
    }

    private static String programVersion() {
        Bundle bundle = FrameworkUtil.getBundle(HeadlessApplication.class);
        return bundle == null ? "development" : bundle.getVersion().toString();
    }

    @Override
    public void stop() {
        // batch runs finish on their own; nothing to interrupt
    }
}
