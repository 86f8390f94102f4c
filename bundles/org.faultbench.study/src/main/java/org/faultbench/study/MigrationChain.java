package org.faultbench.study;

import java.util.List;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * Brings a versioned JSON document up to the current version of its format by applying {@link FormatMigration}s one
 * version at a time, so a file written by any earlier program still opens. Documents that are not objects or carry
 * no usable version are passed through unchanged: the format's reader reports them with the field named.
 */
public final class MigrationChain {
    private final String versionField;
    private final int currentVersion;
    private final List<FormatMigration> steps;

    public MigrationChain(String versionField, int currentVersion, List<FormatMigration> steps) {
        this.versionField = versionField;
        this.currentVersion = currentVersion;
        this.steps = List.copyOf(steps);
    }

    public int currentVersion() {
        return currentVersion;
    }

    /**
     * The document at the current version; {@code root} itself when no step applies.
     *
     * @throws StudyFormatException naming the file and the version field when the file is newer than this program or
     *         a step is missing
     */
    public JsonElement migrate(JsonElement root, String fileName) throws StudyFormatException {
        int version = versionOf(root);
        if (version < 1 || version >= currentVersion) {
            return root;
        }
        JsonObject doc = root.getAsJsonObject().deepCopy();
        while (version < currentVersion) {
            doc = stepFrom(version, fileName).step().apply(doc); // doc is this method's own copy
            int reached = versionOf(doc);
            if (reached != version + 1) {
                throw new StudyFormatException(fileName, versionField, "migration from version " + version
                        + " ended at version " + reached + " instead of " + (version + 1));
            }
            version = reached;
        }
        return doc;
    }

    private FormatMigration stepFrom(int version, String fileName) throws StudyFormatException {
        for (FormatMigration step : steps) {
            if (step.fromVersion() == version) {
                return step;
            }
        }
        throw new StudyFormatException(fileName, versionField, "this program cannot convert version " + version
                + " to version " + currentVersion);
    }

    /** The whole-number version of the document, or 0 when it has none. */
    private int versionOf(JsonElement root) {
        if (root == null || !root.isJsonObject()) {
            return 0;
        }
        JsonElement v = root.getAsJsonObject().get(versionField);
        if (v == null || !v.isJsonPrimitive() || !v.getAsJsonPrimitive().isNumber()) {
            return 0;
        }
        double value = v.getAsDouble();
        return value == Math.rint(value) && value >= 1 && value <= Integer.MAX_VALUE ? (int) value : 0;
    }
}
