package org.faultbench.digitize.ui.editing;

/**
 * Contour colours by depth, our own ramp: shallow contours warm ochre, mid depths olive green, deep contours dark
 * slate blue, so the crest of a structure stands out on a grey or cream scan. Depth is positive down.
 */
public final class DepthColours {
    private static final int[][] STOPS = { { 204, 102, 0 }, { 96, 128, 32 }, { 32, 64, 144 } };

    private DepthColours() {
    }

    /**
     * @param depth the contour value, metres
     * @param shallowest the smallest contour value on the sheet
     * @param deepest the largest contour value on the sheet
     * @return {red, green, blue}, 0-255
     */
    public static int[] rgb(double depth, double shallowest, double deepest) {
        double t = deepest > shallowest ? (depth - shallowest) / (deepest - shallowest) : 0;
        t = Math.max(0, Math.min(1, t)) * (STOPS.length - 1);
        int low = Math.min((int) Math.floor(t), STOPS.length - 2);
        double f = t - low;
        int[] rgb = new int[3];
        for (int c = 0; c < 3; c++) {
            rgb[c] = (int) Math.round(STOPS[low][c] + f * (STOPS[low + 1][c] - STOPS[low][c]));
        }
        return rgb;
    }
}
