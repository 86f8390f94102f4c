package org.faultbench.faults.repair;

/**
 * Id and display name for a fault an edit creates.
 *
 * @param id unique identifier in the fault model
 * @param name display name, used in messages
 */
public record FaultLabel(String id, String name) {

    public FaultLabel {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("new fault: id is empty");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("new fault '" + id + "': name is empty");
        }
    }
}
