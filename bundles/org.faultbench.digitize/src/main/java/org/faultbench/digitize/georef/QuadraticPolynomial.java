package org.faultbench.digitize.georef;

/**
 * One map coordinate as a second-order polynomial of the pixel position:
 * {@code value = constant + col·c + row·r + col²·cc + col·row·cr + row²·rr}.
 */
public record QuadraticPolynomial(double constant, double col, double row, double colSquared, double colRow,
        double rowSquared) {

    public QuadraticPolynomial {
        for (double coefficient : new double[] { constant, col, row, colSquared, colRow, rowSquared }) {
            if (!Double.isFinite(coefficient)) {
                throw new IllegalArgumentException("polynomial coefficient must be a finite number, was " + coefficient);
            }
        }
    }

    /** The coefficients in the order constant, col, row, col², col·row, row². */
    public static QuadraticPolynomial of(double[] coefficients) {
        if (coefficients.length != 6) {
            throw new IllegalArgumentException("a second-order polynomial has 6 coefficients, got " + coefficients.length);
        }
        return new QuadraticPolynomial(coefficients[0], coefficients[1], coefficients[2], coefficients[3],
                coefficients[4], coefficients[5]);
    }

    /** The value at pixel position (c, r). */
    public double valueAt(double c, double r) {
        return constant + col * c + row * r + colSquared * c * c + colRow * c * r + rowSquared * r * r;
    }

    /** Partial derivative with respect to the column at (c, r). */
    public double slopeAlongCol(double c, double r) {
        return col + 2 * colSquared * c + colRow * r;
    }

    /** Partial derivative with respect to the row at (c, r). */
    public double slopeAlongRow(double c, double r) {
        return row + colRow * c + 2 * rowSquared * r;
    }
}
