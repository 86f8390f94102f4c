package org.faultbench.core.uncertain;

import java.util.function.Supplier;

/** Argument checks shared by the distributions, so every message names the field and the bad value. */
final class Checks {

    private Checks() {
    }

    static double requireFinite(double value, String field) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, was " + value);
        }
        return value;
    }

    static double requirePositive(double value, String field) {
        requireFinite(value, field);
        if (value <= 0) {
            throw new IllegalArgumentException(field + " must be > 0, was " + value);
        }
        return value;
    }

    /** A truncation limit: infinite means "no limit on this side", NaN is never allowed. */
    static double requireLimit(double value, String field) {
        if (Double.isNaN(value)) {
            throw new IllegalArgumentException(field + " must be a number or an infinite (open) limit, was NaN");
        }
        return value;
    }

    static void requireBelow(double low, double high, String lowField, String highField) {
        if (!(low < high)) {
            throw new IllegalArgumentException(lowField + " " + low + " must be below " + highField + " " + high);
        }
    }

    static double requireProbability(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("probability p must be in [0, 1], was " + p);
        }
        return p;
    }

    /** Prefixes the message of a rejected construction with the field it was for. */
    static <T> T labelled(String field, Supplier<T> construction) {
        try {
            return construction.get();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(field + ": " + e.getMessage(), e);
        }
    }

    static IllegalArgumentException outsideBounds(String field, String what, Bounds bounds) {
        return new IllegalArgumentException(field + ": " + what + " leaves the allowed range " + bounds);
    }
}
