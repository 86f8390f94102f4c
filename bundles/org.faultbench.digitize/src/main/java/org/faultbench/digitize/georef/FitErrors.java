package org.faultbench.digitize.georef;

/** The messages a geologist sees when control points cannot fix a transform; one wording for every kind. */
final class FitErrors {

    private FitErrors() {
    }

    static IllegalArgumentException tooFew(TransformKind kind, int enabled) {
        String named = named(kind);
        return new IllegalArgumentException(Character.toUpperCase(named.charAt(0)) + named.substring(1)
                + " needs at least " + kind.minimumPoints() + " enabled control points; " + enabled + " "
                + (enabled == 1 ? "is" : "are") + " enabled");
    }

    static IllegalArgumentException degenerate(TransformKind kind, int enabled, String why) {
        return new IllegalArgumentException("the " + enabled + " enabled control points do not fix " + named(kind)
                + ": " + why + "; spread the control points across the map");
    }

    /** "an affine transform", "a projective transform", ... */
    static String named(TransformKind kind) {
        return ("aeiou".indexOf(kind.label().charAt(0)) >= 0 ? "an " : "a ") + kind.label() + " transform";
    }
}
