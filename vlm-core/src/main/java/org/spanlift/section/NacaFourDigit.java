package org.spanlift.section;

import java.util.Objects;

/**
 * The NACA four-digit mean line (Jacobs, Ward and Pinkerton, NACA Report 460, 1933; Abbott and von Doenhoff,
 * Theory of Wing Sections, 1959, section 6.4). Designation {@code NACA MPTT}: maximum camber m = M/100 at
 * chord fraction p = P/10, thickness TT per cent (the thickness does not enter the mean line).
 *
 * <pre>
 *   z = m/p^2     (2 p x - x^2)          for 0 &lt;= x &lt;  p
 *   z = m/(1-p)^2 (1 - 2 p + 2 p x - x^2) for p &lt;= x &lt;= 1
 * </pre>
 *
 * The slope is continuous, its derivative jumps at x = p (reported by {@link #breakpoints()}). The symmetric
 * sections 00TT have z = 0, like the flat plate, and keep their designation.
 */
public final class NacaFourDigit implements CamberLine {

    private final int camberDigit;
    private final int positionDigit;
    private final int thicknessDigits;
    private final double m;
    private final double p;
    private final double foreFactor;   // 2 m / p^2
    private final double aftFactor;    // 2 m / (1 - p)^2

    /**
     * @param camberDigit     M, maximum camber in per cent of chord, 0 to 9
     * @param positionDigit   P, chordwise position of maximum camber in tenths, 1 to 9 (0 when M is 0)
     * @param thicknessDigits TT, maximum thickness in per cent of chord, 1 to 99
     */
    public NacaFourDigit(int camberDigit, int positionDigit, int thicknessDigits) {
        if (camberDigit < 0 || camberDigit > 9) {
            throw new IllegalArgumentException("NACA four-digit camber digit must be 0 to 9, got " + camberDigit);
        }
        if (positionDigit < 0 || positionDigit > 9) {
            throw new IllegalArgumentException("NACA four-digit camber-position digit must be 0 to 9, got "
                    + positionDigit);
        }
        if (camberDigit == 0 && positionDigit != 0) {
            throw new IllegalArgumentException(String.format(
                    "NACA 0%d%02d: a section without camber must have camber-position digit 0 (NACA 00TT)",
                    positionDigit, thicknessDigits));
        }
        if (camberDigit != 0 && positionDigit == 0) {
            throw new IllegalArgumentException(String.format(
                    "NACA %d0%02d: a cambered section needs a camber-position digit 1 to 9", camberDigit,
                    thicknessDigits));
        }
        if (thicknessDigits < 1 || thicknessDigits > 99) {
            throw new IllegalArgumentException("NACA four-digit thickness must be 01 to 99 per cent, got "
                    + thicknessDigits);
        }
        this.camberDigit = camberDigit;
        this.positionDigit = positionDigit;
        this.thicknessDigits = thicknessDigits;
        this.m = camberDigit / 100.0;
        this.p = positionDigit / 10.0;
        this.foreFactor = camberDigit == 0 ? 0.0 : 2.0 * m / (p * p);
        this.aftFactor = camberDigit == 0 ? 0.0 : 2.0 * m / ((1.0 - p) * (1.0 - p));
    }

    /** Maximum camber m, in chords. */
    public double maxCamber() {
        return m;
    }

    /** Chordwise position p of the maximum camber (0 for a symmetric section). */
    public double maxCamberPosition() {
        return p;
    }

    /** Maximum thickness, in chords. */
    public double thickness() {
        return thicknessDigits / 100.0;
    }

    /** Whether this is a symmetric 00TT section (no camber). */
    public boolean isSymmetric() {
        return camberDigit == 0;
    }

    @Override
    public double z(double x) {
        if (x < p) {
            return 0.5 * foreFactor * (2.0 * p * x - x * x);
        }
        return 0.5 * aftFactor * (1.0 - 2.0 * p + 2.0 * p * x - x * x);
    }

    @Override
    public double slope(double x) {
        return (x < p ? foreFactor : aftFactor) * (p - x);
    }

    @Override
    public double[] breakpoints() {
        return camberDigit == 0 ? new double[0] : new double[] {p};
    }

    @Override
    public String designation() {
        return String.format("NACA %d%d%02d", camberDigit, positionDigit, thicknessDigits);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NacaFourDigit other && other.camberDigit == camberDigit
                && other.positionDigit == positionDigit && other.thicknessDigits == thicknessDigits;
    }

    @Override
    public int hashCode() {
        return Objects.hash(camberDigit, positionDigit, thicknessDigits);
    }

    @Override
    public String toString() {
        return designation();
    }
}
