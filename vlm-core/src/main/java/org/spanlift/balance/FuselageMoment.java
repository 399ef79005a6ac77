package org.spanlift.balance;

import java.util.Locale;

import org.spanlift.geometry.Fuselage;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;

/**
 * The fuselage's contribution to the pitching-moment slope, an empirical estimate (Gilruth and White, NACA Report
 * 711, 1941, as the stability texts give it):
 *
 * <pre>  dCm/dalpha (per degree) = K_f w^2 L / (S c)</pre>
 *
 * with w the fuselage's greatest width, L its length, S and c the reference area and chord, and K_f an empirical
 * factor read from a chart against the position of the wing root's quarter chord behind the nose, as a fraction of
 * L. A slope only: no fuselage moment at zero angle of attack enters the trim (the moment is taken as the slope
 * times the angle of attack of the body x axis). Destabilizing (positive).
 *
 * <p><b>Where K_f comes from.</b> The chart could not be read when this was written: the values below are recalled
 * from memory of the chart as the stability texts reproduce it, rounded up (a larger K_f moves the neutral point
 * forward, the safe side), and may be off by 20 per cent. Positions outside the chart (0.1 to 0.6) are refused.
 *
 * <pre>
 *   root quarter chord / L   0.1     0.2     0.3     0.4     0.5     0.6
 *   K_f                      0.0050  0.0070  0.0100  0.0150  0.0230  0.0320
 * </pre>
 */
public final class FuselageMoment {

    private static final double[] POSITION = {0.1, 0.2, 0.3, 0.4, 0.5, 0.6};
    private static final double[] FACTOR = {0.0050, 0.0070, 0.0100, 0.0150, 0.0230, 0.0320};

    private FuselageMoment() {
    }

    /** The empirical factor K_f at the given position (root quarter chord behind the nose over L). */
    public static double factor(double position) {
        if (!(position >= POSITION[0] && position <= POSITION[POSITION.length - 1])) {
            throw new RefusedException(String.format(Locale.ROOT, "the wing root's quarter chord lies at %.2f of the "
                    + "fuselage length behind its nose, outside the empirical chart (0.1 to 0.6); check the "
                    + "fuselage's nose-x and length", position));
        }
        int i = 0;
        while (i < POSITION.length - 2 && position > POSITION[i + 1]) {
            i++;
        }
        double t = (position - POSITION[i]) / (POSITION[i + 1] - POSITION[i]);
        return FACTOR[i] + t * (FACTOR[i + 1] - FACTOR[i]);
    }

    /** The root quarter chord's position behind the nose as a fraction of the fuselage length. */
    public static double position(Wing wing, Fuselage fuselage) {
        var root = wing.main().planform();
        double quarter = root.noseX(root.yStart()) + 0.25 * root.chord(root.yStart());
        return (quarter - fuselage.noseX()) / fuselage.length();
    }

    /** The fuselage's dCm/dalpha, per radian, on the wing's reference area and chord. */
    public static double slope(Wing wing, Fuselage fuselage) {
        double perDegree = factor(position(wing, fuselage)) * fuselage.width() * fuselage.width() * fuselage.length()
                / (wing.reference().area() * wing.reference().chord());
        return Math.toDegrees(perDegree);
    }
}
