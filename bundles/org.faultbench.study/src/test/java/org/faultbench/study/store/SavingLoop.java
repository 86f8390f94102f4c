package org.faultbench.study.store;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.study.ProjectFile;

/**
 * Child process of {@link KillDuringSaveTest}: saves versions first, first + 1, ... of a project file in the
 * workspace folder given as first argument, printing "saved N" after each save returns, until it is killed.
 */
public final class SavingLoop {
    private SavingLoop() {
    }

    /** A project of some 60 kB whose name and every path carry the version, so a mixed file would show. */
    static ProjectFile version(long n) {
        List<String> grids = new ArrayList<>();
        for (int i = 0; i < 1500; i++) {
            grids.add("grids/v" + n + "/grid-" + i + ".asc");
        }
        return new ProjectFile("version " + n, LengthUnit.METRE, OptionalInt.empty(), "", Optional.empty(),
                List.of(), List.of(), grids, List.of(), List.of());
    }

    public static void main(String[] args) throws Exception {
        Path workspace = Path.of(args[0]);
        long n = Long.parseLong(args[1]);
        ProjectStore store = new ProjectStore();
        Path warmUp = Files.createDirectories(workspace.resolveSibling(workspace.getFileName() + "-warm-up"));
        store.save(warmUp, version(0)); // loads the classes, so the parent's random delays land among real saves
        System.out.println("ready");
        System.out.flush();
        while (true) {
            store.save(workspace, version(n));
            System.out.println("saved " + n);
            System.out.flush();
            n++;
        }
    }
}
