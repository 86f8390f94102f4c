package org.faultbench.sim;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.core.extension.ElementStub;
import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExtensionContributionsTest {

    record NamedOutput(String id, boolean fails) implements ResultOutput {
        public String name() {
            return "Output " + id;
        }

        public void write(SimulationResult result, Path outputDirectory) throws IOException {
            if (fails) {
                throw new IOException("disk full");
            }
            Files.writeString(outputDirectory.resolve(id + ".txt"), result.studyName());
        }
    }

    record Shift(String id, UncertainValue distribution, InputTarget target, Bounds bounds) implements SampledInput {
        Shift(String id, UncertainValue distribution) {
            this(id, distribution, InputTarget.DEPTH_SHIFT, Bounds.UNBOUNDED);
        }

        public String name() {
            return "Shift " + id;
        }
    }

    private static SimulationResult result() {
        return new SimulationResult("Invented study", SimulationSettings.of(10, 1), 10, true, List.of(), List.of(),
                Map.of(), List.of());
    }

    @Test
    void outputsAreReadValidatedAndRunAfterARun(@TempDir Path dir) throws IOException {
        Map<String, ResultOutput> outputs = new LinkedHashMap<>();
        List<String> problems = ResultOutputContributions.readInto(outputs, ElementStub.all(
                element("output").by("b.ok").with("id", "ok").creates("class", new NamedOutput("ok", false)),
                element("output").by("b.fails").with("id", "fails").creates("class", new NamedOutput("fails", true)),
                element("output").by("b.twice").with("id", "ok").creates("class", new NamedOutput("ok", false)),
                element("output").by("b.type").with("id", "t").creates("class", "not an output")));
        assertEquals(List.of("ok", "fails"), List.copyOf(outputs.keySet()));
        assertEquals(2, problems.size(), problems.toString());
        assertTrue(problems.get(0).contains("b.twice") && problems.get(0).contains("already registered"));
        assertTrue(problems.get(1).contains("b.type") && problems.get(1).contains("does not implement ResultOutput"));
        List<String> failures = ResultOutputContributions.writeAll(List.copyOf(outputs.values()), result(), dir);
        assertEquals("Invented study", Files.readString(dir.resolve("ok.txt")));
        assertEquals(1, failures.size());
        assertTrue(failures.get(0).contains("Output fails") && failures.get(0).contains("disk full"));
    }

    @Test
    void sampledInputsNeedADistribution() {
        Map<String, SampledInput> inputs = new LinkedHashMap<>();
        List<String> problems = SampledInputContributions.readInto(inputs, ElementStub.all(
                element("input").by("b.ok").with("id", "s").creates("class", new Shift("s", UncertainValue.fixed(0))),
                element("input").by("b.none").with("id", "n").creates("class", new Shift("n", null)),
                element("input").by("b.aim").with("id", "a").creates("class",
                        new Shift("a", UncertainValue.fixed(0), null, Bounds.UNBOUNDED)),
                element("input").by("b.out").with("id", "o").creates("class",
                        new Shift("o", UncertainValue.uniform(-1, 1), InputTarget.THROW_SCALE, Bounds.NON_NEGATIVE))));
        assertEquals(List.of("s"), List.copyOf(inputs.keySet()));
        assertEquals(3, problems.size(), problems.toString());
        assertEquals("sampled input 'n' contributed by b.none: distribution() returned nothing", problems.get(0));
        assertEquals("sampled input 'a' contributed by b.aim: target() returned nothing", problems.get(1));
        assertTrue(problems.get(2).startsWith("sampled input 'o' contributed by b.out: sampled input 'o'"),
                problems.get(2));
        assertTrue(ResultOutputContributions.platformOutputs().isEmpty(), "no registry outside OSGi");
        assertEquals(List.of("ssf-maximum-sealing"), List.copyOf(SampledInputContributions.platformInputs().keySet()),
                "outside OSGi only the built-in inputs");
    }

    @Test
    void pluginXmlContributesEveryBuiltInInput() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("sim.bundle.dir", "."), "plugin.xml"));
        for (SampledInput input : SampledInputContributions.builtIns().values()) {
            assertTrue(pluginXml.contains("<input id=\"" + input.id() + "\" name=\"" + input.name() + "\""),
                    input.id());
            assertTrue(pluginXml.contains("class=\"" + input.getClass().getName() + "\""), input.id());
        }
    }
}
