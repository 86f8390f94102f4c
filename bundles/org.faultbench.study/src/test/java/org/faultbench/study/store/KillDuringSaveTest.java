package org.faultbench.study.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.faultbench.study.ProjectFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills (SIGKILL on Linux: {@link Process#destroyForcibly()}) a process that saves a project file in a loop at
 * seeded random moments, and checks after every kill that opening with recovery yields a complete version: the last
 * one the child acknowledged, or the one it was saving when killed. The child's output goes to a file, not a pipe,
 * so no acknowledgement is lost when the process dies.
 */
class KillDuringSaveTest {
    private static final int KILLS = 20;
    private static final long SEED = 20261202L;

    @TempDir
    Path scratch;

    @Test
    void everyKillLeavesTheLastAcknowledgedOrTheNextCompleteVersion() throws Exception {
        Random random = new Random(SEED);
        Path workspace = Files.createDirectories(scratch.resolve("workspace"));
        ProjectStore store = new ProjectStore();
        long next = 1;
        int leftovers = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            Path output = scratch.resolve("child-" + kill + ".txt");
            Process child = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-cp", System.getProperty("java.class.path"), SavingLoop.class.getName(),
                    workspace.toString(), Long.toString(next))
                    .redirectErrorStream(true).redirectOutput(output.toFile()).start();
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
            while (!lines(output).contains("ready") && child.isAlive() && System.nanoTime() < deadline) {
                Thread.sleep(2);
            }
            assertTrue(lines(output).contains("ready"), "child did not start: " + lines(output));
            Thread.sleep(random.nextInt(60));
            child.destroyForcibly();
            assertTrue(child.waitFor(20, TimeUnit.SECONDS), "child did not die");

            long acknowledged = next - 1;
            for (String line : lines(output)) {
                if (line.startsWith("saved ")) {
                    acknowledged = Long.parseLong(line.substring(6));
                } else {
                    assertEquals("ready", line, "unexpected output of the child");
                }
            }
            if (acknowledged == 0 && !Files.exists(ProjectStore.projectFile(workspace))) {
                continue; // killed before the very first save completed: nothing was promised yet
            }
            OpenedProject opened = store.open(workspace);
            ProjectFile project = opened.project();
            long found = Long.parseLong(project.name().substring("version ".length()));
            assertTrue(found == acknowledged || found == acknowledged + 1,
                    "kill " + kill + ": found version " + found + ", last acknowledged " + acknowledged);
            assertEquals(SavingLoop.version(found), project, "kill " + kill + ": version " + found + " incomplete");
            if (!opened.report().notes().isEmpty()) {
                leftovers++;
            }
            next = found + 1;
        }
        assertTrue(next > 2, "the children should have saved some versions, made " + (next - 1));
        System.out.println("KillDuringSaveTest: " + KILLS + " kills, " + (next - 1) + " versions saved, "
                + leftovers + " opens cleaned up after an interrupted save");
    }

    private static List<String> lines(Path file) throws IOException {
        return Files.exists(file) ? Files.readAllLines(file, StandardCharsets.UTF_8) : List.of();
    }
}
