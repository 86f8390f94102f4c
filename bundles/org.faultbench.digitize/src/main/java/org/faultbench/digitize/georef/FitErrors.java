package org.faultbench.digitize.georef;

/** The messages a geologist sees when control points cannot fix a transform; one wording for every type. */
final class FitErrors {

    private FitErrors() {
    }

    static IllegalArgumentException tooFew(TransformType type, int enabled) {
        String named = named(type);
        return new IllegalArgumentException(Character.toUpperCase(named.charAt(0)) + named.substring(1)
                + " needs at least " + type.minimumPoints() + " enabled control points; " + enabled + " "
                + (enabled == 1 ? "is" : "are") + " enabled");
    }

    static IllegalArgumentException degenerate(TransformKind kind, int enabled, String why) {
        return degenerate(TransformType.of(kind), enabled, why);
    }

    static IllegalArgumentException degenerate(TransformType type, int enabled, String why) {
        return new IllegalArgumentException("the " + enabled + " enabled control points do not fix " + named(type)
                + ": " + why + "; spread the control points across the map");
    }

    /** "an affine transform", "a projective transform", ... */
    static String named(TransformType type) {
        String name = type.name();
        return ("aeiou".indexOf(Character.toLowerCase(name.charAt(0))) >= 0 ? "an " : "a ") + name + " transform";
    }
}
