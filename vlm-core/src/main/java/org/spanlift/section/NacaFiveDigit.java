package org.spanlift.section;

import java.util.Objects;

/**
 * The non-reflexed mean lines of the NACA five-digit 230-series family, 210 to 250 (Jacobs and Pinkerton,
 * NACA Report 537; Abbott and von Doenhoff, Theory of Wing Sections, 1959, section 6.4). Designation
 * {@code NACA 2P0TT}: design lift coefficient 0.3 (first digit 2), maximum camber at about P/20 of the
 * chord (P = 1 to 5), non-reflexed (third digit 0), thickness TT per cent.
 *
 * <pre>
 *   z = (k1/6) (x^3 - 3 r x^2 + r^2 (3 - r) x)   for 0 &lt;= x &lt;  r
 *   z = (k1/6) r^3 (1 - x)                       for r &lt;= x &lt;= 1
 * </pre>
 *
 * with the constants r (called m in the source) and k1 of the table of mean-line constants in Abbott and
 * von Doenhoff, section 6.4:
 *
 * <pre>
 *   mean line  max. camber at  r       k1
 *   210        0.05            0.0580  361.4
 *   220        0.10            0.1260   51.64
 *   230        0.15            0.2025   15.957
 *   240        0.20            0.2900    6.643
 *   250        0.25            0.3910    3.230
 * </pre>
 *
 * The slope and its first derivative are continuous at x = r; the second derivative jumps there.
 * Other design lift digits and the reflexed lines (third digit 1) are not provided.
 */
public final class NacaFiveDigit implements CamberLine {

    private static final double[] R = {0.0580, 0.1260, 0.2025, 0.2900, 0.3910};
    private static final double[] K1 = {361.4, 51.64, 15.957, 6.643, 3.230};

    private final int positionDigit;
    private final int thicknessDigits;
    private final double r;
    private final double k1;
    private final double c0;         // (k1/6) r^2 (3 - r): slope at x = 0
    private final double aftSlope;   // -(k1/6) r^3

    /**
     * @param positionDigit   P, 1 to 5 (mean lines 210, 220, 230, 240, 250)
     * @param thicknessDigits TT, maximum thickness in per cent of chord, 1 to 99
     */
    public NacaFiveDigit(int positionDigit, int thicknessDigits) {
        if (positionDigit < 1 || positionDigit > 5) {
            throw new IllegalArgumentException(
                    "NACA five-digit mean line 2" + positionDigit + "0 is not provided: accepted are 210, 220, 230, "
                    + "240, 250");
        }
        if (thicknessDigits < 1 || thicknessDigits > 99) {
            throw new IllegalArgumentException("NACA five-digit thickness must be 01 to 99 per cent, got "
                    + thicknessDigits);
        }
        this.positionDigit = positionDigit;
        this.thicknessDigits = thicknessDigits;
        this.r = R[positionDigit - 1];
        this.k1 = K1[positionDigit - 1];
        this.c0 = k1 / 6.0 * r * r * (3.0 - r);
        this.aftSlope = -k1 / 6.0 * r * r * r;
    }

    /** Mean-line number: 210, 220, 230, 240 or 250. */
    public int meanLineNumber() {
        return 200 + 10 * positionDigit;
    }

    /** The constant r (m in the source): the end of the cubic fore part, in chords. */
    public double r() {
        return r;
    }

    /** The constant k1 of the source table. */
    public double k1() {
        return k1;
    }

    /** Nominal chordwise position of the maximum camber, P/20. */
    public double nominalMaxCamberPosition() {
        return positionDigit / 20.0;
    }

    /**
     * The nominal design lift coefficient the designation states, 0.3 for the whole family (the constants
     * k1 were chosen to give it). {@link ThinAirfoil#idealLiftCoefficient(CamberLine)} computes the ideal lift
     * coefficient of the tabulated line itself.
     */
    public double designLiftCoefficient() {
        return 0.3;
    }

    /** Maximum thickness, in chords. */
    public double thickness() {
        return thicknessDigits / 100.0;
    }

    @Override
    public double z(double x) {
        if (x < r) {
            return k1 / 6.0 * (x * (x * (x - 3.0 * r)) + r * r * (3.0 - r) * x);
        }
        return -aftSlope * (1.0 - x);
    }

    @Override
    public double slope(double x) {
        if (x < r) {
            return k1 * 0.5 * x * (x - 2.0 * r) + c0;
        }
        return aftSlope;
    }

    @Override
    public double[] breakpoints() {
        return new double[] {r};
    }

    @Override
    public String designation() {
        return String.format("NACA 2%d0%02d", positionDigit, thicknessDigits);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NacaFiveDigit other && other.positionDigit == positionDigit
                && other.thicknessDigits == thicknessDigits;
    }

    @Override
    public int hashCode() {
        return Objects.hash(positionDigit, thicknessDigits);
    }

    @Override
    public String toString() {
        return designation();
    }
}
