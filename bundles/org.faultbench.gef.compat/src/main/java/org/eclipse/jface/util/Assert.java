package org.eclipse.jface.util;

/**
 * Restores the JFace 3.2 assertion helper that GEF 3.2 (the only GEF release on Maven Central) still calls.
 * Current JFace no longer has it; as a fragment of org.eclipse.jface this class lands on JFace's class path.
 */
public final class Assert {

    /** Thrown when an assertion fails, as in JFace 3.2. */
    public static class AssertionFailedException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public AssertionFailedException(String detail) {
            super(detail);
        }
    }

    private Assert() {
    }

    public static boolean isLegal(boolean expression) {
        return isLegal(expression, "");
    }

    public static boolean isLegal(boolean expression, String message) {
        if (!expression) {
            throw new IllegalArgumentException(message);
        }
        return expression;
    }

    public static void isNotNull(Object object) {
        isNotNull(object, "");
    }

    public static void isNotNull(Object object, String message) {
        if (object == null) {
            throw new AssertionFailedException("null argument:" + message);
        }
    }

    public static boolean isTrue(boolean expression) {
        return isTrue(expression, "");
    }

    public static boolean isTrue(boolean expression, String message) {
        if (!expression) {
            throw new AssertionFailedException("assertion failed: " + message);
        }
        return expression;
    }
}
