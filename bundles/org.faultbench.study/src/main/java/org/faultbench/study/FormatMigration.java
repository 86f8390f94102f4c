package org.faultbench.study;

import java.util.function.UnaryOperator;

import com.google.gson.JsonObject;

/**
 * One small step of a file format's history: turns a document of version {@code fromVersion} into one of version
 * {@code fromVersion + 1}. Steps are pure functions of the JSON so each can be tested alone.
 *
 * @param fromVersion the version the step reads
 * @param step the conversion; it gets a private copy and must set the version field to {@code fromVersion + 1}
 */
public record FormatMigration(int fromVersion, UnaryOperator<JsonObject> step) {
}
