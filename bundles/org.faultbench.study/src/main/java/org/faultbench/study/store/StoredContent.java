package org.faultbench.study.store;

/**
 * The bytes of a stored file as opened, with the report of any recovery that was needed.
 *
 * @param content the complete, checked content
 * @param report what opening had to do
 */
public record StoredContent(byte[] content, RecoveryReport report) {
}
