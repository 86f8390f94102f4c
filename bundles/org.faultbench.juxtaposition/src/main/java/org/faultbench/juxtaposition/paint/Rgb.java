package org.faultbench.juxtaposition.paint;

/**
 * Colours as packed 0xRRGGBB integers, so painters stay free of any UI toolkit and can be tested without a display;
 * the viewer converts them to its own colour objects.
 */
public final class Rgb {

    public static final int WHITE = 0xFFFFFF;

    private Rgb() {
    }

    /** @throws IllegalArgumentException when a channel is outside 0..255 */
    public static int of(int red, int green, int blue) {
        if ((red | green | blue) >>> 8 != 0) {
            throw new IllegalArgumentException("colour channels must be 0..255, were " + red + ", " + green + ", "
                    + blue);
        }
        return red << 16 | green << 8 | blue;
    }

    public static int red(int rgb) {
        return rgb >> 16 & 0xFF;
    }

    public static int green(int rgb) {
        return rgb >> 8 & 0xFF;
    }

    public static int blue(int rgb) {
        return rgb & 0xFF;
    }

    /** Linear mix: a at t = 0, b at t = 1 (t clamped to [0, 1]), each channel rounded. */
    public static int blend(int a, int b, double t) {
        double s = Double.isNaN(t) ? 0 : Math.max(0, Math.min(1, t));
        return of(mix(red(a), red(b), s), mix(green(a), green(b), s), mix(blue(a), blue(b), s));
    }

    private static int mix(int a, int b, double t) {
        return (int) Math.round(a + t * (b - a));
    }
}
