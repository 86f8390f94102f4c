package org.faultbench.core.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The harness itself: it must fail on what a reader may not do, and only on that. */
class FuzzRunTest {
    private static final List<byte[]> SEEDS = List.of("x 1.5\ny 2.5\n".getBytes(StandardCharsets.US_ASCII));

    /** Accepts "name number" lines, rejects anything else with its documented exception. */
    private static void strictReader(byte[] input) throws IOException {
        for (String line : new String(input, StandardCharsets.ISO_8859_1).split("\n")) {
            String[] parts = line.split(" ");
            if (parts.length != 2) {
                throw new IOException("expected a name and a number: " + line);
            }
            try {
                Double.parseDouble(parts[1]);
            } catch (NumberFormatException e) {
                throw new IOException("not a number: " + parts[1], e);
            }
        }
    }

    @Test
    void aReaderThatOnlyRejectsWithItsDocumentedExceptionPasses() throws InterruptedException {
        FuzzRun.Outcome outcome = FuzzRun.run("strict", 300, SEEDS, IOException.class, FuzzRunTest::strictReader);
        assertEquals(300, outcome.inputs());
        assertEquals(300, outcome.parsed() + outcome.rejected());
        assertTrue(outcome.rejected() > 0, "the mutations break some inputs: " + outcome);
    }

    @Test
    void aRuntimeExceptionFailsTheRunNamingTheSeedAndInput() {
        AssertionError failure = assertThrows(AssertionError.class, () -> FuzzRun.run("careless", 300, SEEDS,
                IOException.class, input -> {
                    String text = new String(input, StandardCharsets.ISO_8859_1);
                    if (!text.startsWith("x 1.5")) {
                        throw new IllegalStateException("unchecked on bad input");
                    }
                }));
        assertTrue(failure.getMessage().contains("careless") && failure.getMessage().contains("IllegalStateException"),
                failure.getMessage());
        assertTrue(failure.getMessage().contains(Long.toString(FuzzRun.seed())), "names the run seed for replay");
    }

    @Test
    void aSeedThatDoesNotParseIsRefused() {
        assertThrows(AssertionError.class, () -> FuzzRun.run("broken", 10, List.of("no".getBytes(
                StandardCharsets.US_ASCII)), IOException.class, FuzzRunTest::strictReader));
    }
}
