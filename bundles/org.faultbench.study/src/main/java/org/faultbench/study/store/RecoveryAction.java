package org.faultbench.study.store;

/** What opening a stored file had to do to hand back a valid version. */
public enum RecoveryAction {
    /** The main file was valid; nothing was restored. */
    NONE("no recovery needed"),
    /** The main file was missing or damaged; the complete temporary file of an interrupted save was restored. */
    RESTORED_FROM_TEMPORARY("restored from the temporary file of an interrupted save"),
    /** The main file was missing or damaged; the backup of the previous save was restored. */
    RESTORED_FROM_BACKUP("restored from the backup of the previous save");

    private final String label;

    RecoveryAction(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
