package org.faultbench.study.store;

import java.nio.file.Path;
import java.util.List;

/**
 * What happened when a stored file was opened, in words a geologist can act on; the UI shows it when
 * {@link #recovered()} or when {@link #notes()} is not empty.
 *
 * @param file the main file
 * @param action what was restored, if anything
 * @param notes one sentence per event: why the main file was rejected, leftovers discarded, where a damaged file
 *        was set aside
 */
public record RecoveryReport(Path file, RecoveryAction action, List<String> notes) {
    public RecoveryReport {
        notes = List.copyOf(notes);
    }

    public static RecoveryReport clean(Path file) {
        return new RecoveryReport(file, RecoveryAction.NONE, List.of());
    }

    /** True when the content handed back did not come from the main file as it was found. */
    public boolean recovered() {
        return action != RecoveryAction.NONE;
    }

    /** One paragraph for a dialog or a log. */
    public String summary() {
        StringBuilder text = new StringBuilder(file.getFileName() + ": " + action.label() + ".");
        for (String note : notes) {
            text.append(' ').append(note);
        }
        return text.toString();
    }
}
