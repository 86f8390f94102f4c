package org.faultbench.study.store;

/**
 * The format check a stored file must pass to count as complete, e.g. "parses as a project file". Recovery uses it
 * to tell a good main file, backup or temporary file from a damaged one.
 */
@FunctionalInterface
public interface ContentCheck {
    /** Accepts everything; use only for files that have no format of their own. */
    ContentCheck ANY = content -> {
    };

    /** Returns normally when {@code content} is a complete, valid file; throws saying what is wrong otherwise. */
    void check(byte[] content) throws Exception;
}
