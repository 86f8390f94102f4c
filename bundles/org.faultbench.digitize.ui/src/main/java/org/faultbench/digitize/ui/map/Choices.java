package org.faultbench.digitize.ui.map;

import java.util.Arrays;
import java.util.function.Function;

/** Enum values as the labels and indices a combo-box property shows and returns. */
final class Choices {

    private Choices() {
    }

    static <E extends Enum<E>> String[] labels(E[] values, Function<E, String> label) {
        return Arrays.stream(values).map(label).toArray(String[]::new);
    }

    static <E extends Enum<E>> E at(E[] values, Object index) {
        return values[(Integer) index];
    }
}
