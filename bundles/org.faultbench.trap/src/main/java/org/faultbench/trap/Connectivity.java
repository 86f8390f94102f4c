package org.faultbench.trap;

/**
 * Which neighbours a flood may step to. Four-connected (the default) only crosses cell sides, so a hydrocarbon
 * column never leaks through a diagonal pinch between two cells; eight-connected also crosses cell corners.
 */
public enum Connectivity {
    FOUR(new int[] {1, -1, 0, 0}, new int[] {0, 0, 1, -1}),
    EIGHT(new int[] {1, -1, 0, 0, 1, 1, -1, -1}, new int[] {0, 0, 1, -1, 1, -1, 1, -1});

    private final int[] di;
    private final int[] dj;

    Connectivity(int[] di, int[] dj) {
        this.di = di;
        this.dj = dj;
    }

    int neighbourCount() {
        return di.length;
    }

    int di(int n) {
        return di[n];
    }

    int dj(int n) {
        return dj[n];
    }
}
