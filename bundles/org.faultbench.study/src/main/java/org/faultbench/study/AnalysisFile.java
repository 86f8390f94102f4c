package org.faultbench.study;

import java.nio.file.Path;

import com.google.gson.JsonObject;

import org.faultbench.sim.TrapStudy;

/**
 * A read and validated analysis file.
 *
 * @param file where it was read from
 * @param sha256 SHA-256 of the file's bytes, reported with results so they can be traced to their inputs
 * @param formatVersion the file's format version
 * @param study the study it describes
 * @param realisations default number of realisations
 * @param seed default random seed
 * @param cellHeight fault-plane cell height for leak probability, m
 * @param document the file's JSON, echoed into results
 */
public record AnalysisFile(Path file, String sha256, int formatVersion, TrapStudy study, int realisations, long seed,
        double cellHeight, JsonObject document) {
}
