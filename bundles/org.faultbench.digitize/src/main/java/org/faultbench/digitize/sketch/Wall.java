package org.faultbench.digitize.sketch;

/** The block on one side of a fault; a cut-off line belongs to one of them. */
public enum Wall {
    FOOTWALL("footwall"),
    HANGING_WALL("hanging-wall");

    private final String label;

    Wall(String label) {
        this.label = label;
    }

    /** "footwall" or "hanging-wall", for messages. */
    public String label() {
        return label;
    }
}
