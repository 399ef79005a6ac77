package org.spanlift.section;

import org.spanlift.input.RefusedException;

/**
 * The empirical correction of a plain trailing-edge flap's section lift, and the section cl_max increment that goes
 * with it. Immutable.
 *
 * <p><b>Units and signs.</b> Deflections are in radians on the API and in degrees in the tables below. A deflection
 * is positive with the trailing edge down. The chord fraction E is the flap chord over the section chord, hinge at
 * x = 1 - E. The zero-lift shift is in radians and negative for a positive deflection; lift increments are section lift
 * coefficients.
 *
 * <p><b>Method.</b> The handbook split of the section lift increment at a fixed angle of attack (USAF Stability and
 * Control DATCOM, R. D. Finck principal investigator, McDonnell Douglas Corporation, Douglas Aircraft Division, for
 * the Air Force Flight Dynamics Laboratory, October 1960, revised April 1978, section 6.1.1.1, plain flaps; the same
 * method appears in J. Roskam, Airplane Design Part VI, 1987, recalled, chapter and figure numbers not checked):
 * <pre>
 *   delta_cl = delta * cl_delta,theory * (cl_delta / cl_delta,theory) * K'(delta, E)
 * </pre>
 * with
 * <ul>
 *   <li>{@code cl_delta,theory = 2 pi tau}, per radian, where tau = -d alpha_L0 / d delta of a hinged thin plate
 *       (Glauert, The Elements of Aerofoil and Airscrew Theory, 1926): with x = (1 - cos theta)/2 and the hinge at
 *       theta_h, cos theta_h = 2E - 1 and
 *       <pre>  tau = 1 - (theta_h - sin theta_h) / pi.</pre>
 *       The handbook's theoretical effectiveness adds a thickness term (its chart of cl_delta,theory against flap
 *       chord and thickness ratio); Spanlift keeps the thin-plate value, consistent with its lattice, which is a few
 *       per cent lower for sections of usual thickness (recalled, not checked);</li>
 *   <li>{@link #effectivenessRatio()}, the ratio of measured to theoretical effectiveness at small deflections (the
 *       viscous loss of a flap immersed in the boundary layer);</li>
 *   <li>{@link #largeDeflectionFactor(double) K'}, which falls from 1 as the flow separates from the flap at larger
 *       deflections, earlier for wider flaps.</li>
 * </ul>
 * {@link #liftEffectiveness(double)} is the product of the last two: the fraction of the thin-airfoil flap lift that
 * a plain flap delivers. The lattice's flap lift is the thin-airfoil one, so this fraction (equivalently
 * {@link #zeroLiftShift(double)}) is what a caller applies to it.
 *
 * <p><b>Where the numbers come from (read what this says before trusting them).</b> The handbook charts could not be
 * read: only title pages and summaries of the sources were available when this class was written. <b>Every tabulated
 * value of {@code cl_delta/cl_delta,theory} and {@code K'} below is recalled from memory, figure 6.1.1.1-39b and
 * figure 6.1.1.1-40 of the USAF DATCOM (the figure numbers are recalled as well), not checked against the text.</b>
 * They carry the charts' shape (K' = 1 at small deflections, falling sooner and further for wider flaps;
 * effectiveness ratio rising with flap chord) but each value may be off by about 0.05, more at the wide chords.
 * Replace them by values read from the figures before relying on them; the tests pin only the properties that have an
 * independent reason.
 *
 * <p>Effectiveness ratio (small deflections) against flap chord fraction, recalled from memory, figure 6.1.1.1-39b of
 * the USAF DATCOM, not checked against the text; read along the curve of an ordinary section whose lift slope is
 * about 0.9 of its theoretical value (the chart's abscissa):
 * <pre>
 *   E      0.10  0.15  0.20  0.25  0.30  0.40  0.50
 *   ratio  0.72  0.77  0.80  0.82  0.84  0.87  0.89
 * </pre>
 * A caller with a measured ratio for its section gives it to {@link #of(double, double)}.
 *
 * <p>Large-deflection factor K' against deflection (degrees) and flap chord fraction, recalled from memory, figure
 * 6.1.1.1-40 of the USAF DATCOM, not checked against the text:
 * <pre>
 *   E \ delta   0     10    20    30    40    50    60
 *   0.10       1.00  1.00  0.92  0.78  0.65  0.56  0.50
 *   0.15       1.00  1.00  0.86  0.72  0.60  0.52  0.46
 *   0.20       1.00  0.97  0.80  0.67  0.56  0.49  0.43
 *   0.25       1.00  0.93  0.76  0.63  0.53  0.46  0.41
 *   0.30       1.00  0.90  0.72  0.59  0.50  0.43  0.39
 *   0.40       1.00  0.84  0.65  0.53  0.45  0.39  0.35
 *   0.50       1.00  0.78  0.58  0.48  0.41  0.36  0.32
 * </pre>
 * Interpolation is linear in deflection along each row, then linear in chord fraction between rows.
 *
 * <p><b>cl_max increment.</b> The handbook value for a plain flap at landing deflection is delta cl_max = 0.9 (read:
 * M. Soler Arnedo, Fundamentals of Aerospace Engineering, LibreTexts edition, section 3.4.3, table 3.1 of the
 * increase in cl_max of airfoils with high-lift devices, after Franchini et al.; the same 0.9 for plain and split
 * flaps is recalled from D. P. Raymer, Aircraft Design: A Conceptual Approach, table of maximum-lift increments of
 * high-lift devices). Neither source gives the deflection or flap chord; Spanlift takes them as 60 degrees and 25% of
 * the chord, as {@code StripLimits} does. The handbook correlation of delta cl_max against deflection and flap
 * chord (DATCOM section 6.1.1.3) could not be read and is not recalled well enough to tabulate. In its place
 * {@link #clMaxIncrement(double)} takes delta cl_max in proportion to the corrected lift increment:
 * <pre>
 *   delta cl_max(delta, E) = 0.9 * delta_cl(delta, E) / delta_cl(60 deg, 0.25).
 * </pre>
 * That proportionality is Spanlift's assumption, not a published correlation. With the tables above it makes delta
 * cl_max about two thirds of delta_cl, below it as plain-flap data are (the flap lowers the stall angle).
 *
 * <p><b>Range.</b> The data cover flap chord fractions 0.10 to 0.50 and deflections 0 to 60 degrees, trailing edge
 * down. Outside them this class <b>refuses</b> ({@link RefusedException}) rather than clamping: holding K' at its
 * 60-degree value would overstate a larger deflection's lift, and an up-going flap is a control deflection the charts
 * do not cover. A caller checks {@link #covers(double)} and {@link #coversChordFraction(double)} first and flags,
 * or reports the refusal. Glauert's tau itself holds for any chord fraction: {@link #glauertTau(double)} gives it
 * without the range check.
 */
public final class PlainFlap {

    /** Smallest flap chord fraction the tables cover. */
    public static final double MIN_CHORD_FRACTION = 0.10;
    /** Largest flap chord fraction the tables cover. */
    public static final double MAX_CHORD_FRACTION = 0.50;
    /** Largest deflection the tables cover, degrees (the smallest is 0). */
    public static final double MAX_DEFLECTION_DEG = 60.0;

    /** Handbook cl_max increment of a plain flap at landing deflection (see the class notes). */
    public static final double REFERENCE_CL_MAX_INCREMENT = 0.9;
    /** The deflection at which {@link #REFERENCE_CL_MAX_INCREMENT} is taken, degrees. */
    public static final double REFERENCE_DEFLECTION_DEG = 60.0;
    /** The flap chord fraction at which {@link #REFERENCE_CL_MAX_INCREMENT} is taken. */
    public static final double REFERENCE_CHORD_FRACTION = 0.25;

    /** Rounding slack on the range ends. */
    private static final double SLACK = 1e-9;

    private static final double[] CHORDS = {0.10, 0.15, 0.20, 0.25, 0.30, 0.40, 0.50};

    /** Recalled from memory, USAF DATCOM figure 6.1.1.1-39b, not checked against the text (class notes). */
    private static final Table RATIO = new Table(CHORDS, new double[] {0.72, 0.77, 0.80, 0.82, 0.84, 0.87, 0.89});

    private static final double[] DEFLECTIONS_DEG = {0, 10, 20, 30, 40, 50, 60};

    /** Recalled from memory, USAF DATCOM figure 6.1.1.1-40, not checked against the text (class notes). */
    private static final double[][] K_PRIME = {
        {1.00, 1.00, 0.92, 0.78, 0.65, 0.56, 0.50},
        {1.00, 1.00, 0.86, 0.72, 0.60, 0.52, 0.46},
        {1.00, 0.97, 0.80, 0.67, 0.56, 0.49, 0.43},
        {1.00, 0.93, 0.76, 0.63, 0.53, 0.46, 0.41},
        {1.00, 0.90, 0.72, 0.59, 0.50, 0.43, 0.39},
        {1.00, 0.84, 0.65, 0.53, 0.45, 0.39, 0.35},
        {1.00, 0.78, 0.58, 0.48, 0.41, 0.36, 0.32},
    };

    private static final Table[] K_PRIME_ROWS = new Table[CHORDS.length];

    static {
        for (int i = 0; i < CHORDS.length; i++) {
            K_PRIME_ROWS[i] = new Table(DEFLECTIONS_DEG, K_PRIME[i]);
        }
    }

    /** The corrected lift increment of the reference flap at the reference deflection, cl. */
    private static final double REFERENCE_LIFT_INCREMENT = 2 * Math.PI * glauertTau(REFERENCE_CHORD_FRACTION)
            * RATIO.at(REFERENCE_CHORD_FRACTION) * kPrime(REFERENCE_CHORD_FRACTION, REFERENCE_DEFLECTION_DEG)
            * Math.toRadians(REFERENCE_DEFLECTION_DEG);

    private final double chordFraction;
    private final double tau;
    private final double ratio;
    private final boolean ratioGiven;

    private PlainFlap(double chordFraction, double ratio, boolean ratioGiven) {
        this.chordFraction = chordFraction;
        this.tau = glauertTau(chordFraction);
        this.ratio = ratio;
        this.ratioGiven = ratioGiven;
    }

    /**
     * A plain flap of the given chord fraction, with the tabulated (recalled) effectiveness ratio.
     *
     * @throws RefusedException outside chord fractions {@value #MIN_CHORD_FRACTION} to
     *                          {@value #MAX_CHORD_FRACTION}
     */
    public static PlainFlap of(double chordFraction) {
        requireChordCovered(chordFraction);
        return new PlainFlap(chordFraction, RATIO.at(chordFraction), false);
    }

    /**
     * A plain flap of the given chord fraction whose small-deflection effectiveness ratio is known for its
     * section (measured d alpha_L0/d delta over the thin-airfoil tau).
     *
     * @throws IllegalArgumentException unless 0 &lt; ratio &lt;= 1.5 (a ratio somewhat above 1 is possible for
     *                                  thick sections against the thin-plate tau; 1.5 is surely an input error)
     * @throws RefusedException         outside the covered chord fractions
     */
    public static PlainFlap of(double chordFraction, double effectivenessRatio) {
        requireChordCovered(chordFraction);
        if (!(effectivenessRatio > 0 && effectivenessRatio <= 1.5)) {
            throw new IllegalArgumentException("the effectiveness ratio must lie in (0, 1.5], got "
                    + effectivenessRatio);
        }
        return new PlainFlap(chordFraction, effectivenessRatio, true);
    }

    /**
     * Glauert's thin-airfoil flap effectiveness tau = -d alpha_L0/d delta for a flap of chord fraction E,
     * 0 &lt;= E &lt;= 1, without the range check of the tables (tau(0) = 0, tau(1) = 1).
     */
    public static double glauertTau(double chordFraction) {
        if (!(chordFraction >= 0 && chordFraction <= 1)) {
            throw new IllegalArgumentException("a flap chord fraction lies in [0, 1], got " + chordFraction);
        }
        double thetaH = Math.acos(2 * chordFraction - 1);
        return 1 - (thetaH - Math.sin(thetaH)) / Math.PI;
    }

    /** Whether the tables cover this flap chord fraction. */
    public static boolean coversChordFraction(double chordFraction) {
        return chordFraction >= MIN_CHORD_FRACTION - SLACK && chordFraction <= MAX_CHORD_FRACTION + SLACK;
    }

    /** Whether the tables cover this deflection (rad): 0 to {@value #MAX_DEFLECTION_DEG} degrees. */
    public boolean covers(double deflection) {
        double deg = Math.toDegrees(deflection);
        return deg >= -SLACK && deg <= MAX_DEFLECTION_DEG + SLACK;
    }

    /** The range the data cover, in words, for outputs and refusals. */
    public static String range() {
        return "flap chord fractions " + MIN_CHORD_FRACTION + " to " + MAX_CHORD_FRACTION + ", deflections 0 to "
                + (int) MAX_DEFLECTION_DEG + " deg trailing edge down";
    }

    /** The flap chord over the section chord. */
    public double chordFraction() {
        return chordFraction;
    }

    /** Glauert's tau for this flap: the magnitude of d alpha_L0/d delta of a hinged thin plate. */
    public double thinAirfoilEffectiveness() {
        return tau;
    }

    /** The thin-airfoil lift effectiveness cl_delta,theory = 2 pi tau, per radian. */
    public double thinAirfoilLiftEffectiveness() {
        return 2 * Math.PI * tau;
    }

    /** The small-deflection ratio cl_delta/cl_delta,theory: the one given, else the tabulated one. */
    public double effectivenessRatio() {
        return ratio;
    }

    /** Whether {@link #effectivenessRatio()} was given for the section rather than tabulated. */
    public boolean effectivenessRatioGiven() {
        return ratioGiven;
    }

    /**
     * K', the large-deflection factor at this deflection (rad).
     *
     * @throws RefusedException outside the covered deflections
     */
    public double largeDeflectionFactor(double deflection) {
        return kPrime(chordFraction, requireCovered(deflection));
    }

    /**
     * The fraction of the thin-airfoil flap lift delivered at this deflection (rad): effectiveness ratio
     * times K'.
     *
     * @throws RefusedException outside the covered deflections
     */
    public double liftEffectiveness(double deflection) {
        return ratio * largeDeflectionFactor(deflection);
    }

    /**
     * The section lift increment at a fixed angle of attack (below the stall),
     * 2 pi tau * ratio * K' * deflection.
     *
     * @throws RefusedException outside the covered deflections
     */
    public double liftIncrement(double deflection) {
        return thinAirfoilLiftEffectiveness() * liftEffectiveness(deflection) * deflection;
    }

    /**
     * The change of the section zero-lift angle, rad: -tau * ratio * K' * deflection (negative for a
     * positive deflection).
     *
     * @throws RefusedException outside the covered deflections
     */
    public double zeroLiftShift(double deflection) {
        return -tau * liftEffectiveness(deflection) * deflection;
    }

    /**
     * The section cl_max increment at this deflection (rad): the handbook value at the reference flap and
     * deflection, scaled with the corrected lift increment (Spanlift's assumption; see the class notes).
     *
     * @throws RefusedException outside the covered deflections
     */
    public double clMaxIncrement(double deflection) {
        return REFERENCE_CL_MAX_INCREMENT * liftIncrement(deflection) / REFERENCE_LIFT_INCREMENT;
    }

    /** A short statement of the sources, for outputs to carry. */
    public static String source() {
        return "plain-flap lift: thin-airfoil tau (Glauert) x effectiveness ratio x K' after USAF DATCOM 6.1.1.1"
                + " (figs 6.1.1.1-39b, -40; values recalled, not checked against the charts); cl_max increment"
                + " 0.9 at 60 deg for a 25% flap (Raymer; Arnedo table 3.1), scaled with the lift increment";
    }

    @Override
    public String toString() {
        return "PlainFlap[E=" + chordFraction + ", tau=" + tau + ", ratio=" + ratio
                + (ratioGiven ? " (given)" : " (tabulated)") + "]";
    }

    /** K' at a chord fraction and deflection (degrees) inside the tables: along the rows, then between them. */
    private static double kPrime(double chordFraction, double deg) {
        int n = CHORDS.length;
        int hi = 1;
        while (hi < n - 1 && CHORDS[hi] < chordFraction) {
            hi++;
        }
        int lo = hi - 1;
        double w = Math.max(0, Math.min(1, (chordFraction - CHORDS[lo]) / (CHORDS[hi] - CHORDS[lo])));
        return (1 - w) * K_PRIME_ROWS[lo].at(deg) + w * K_PRIME_ROWS[hi].at(deg);
    }

    private static void requireChordCovered(double chordFraction) {
        if (Double.isNaN(chordFraction)) {
            throw new IllegalArgumentException("the flap chord fraction is NaN");
        }
        if (!coversChordFraction(chordFraction)) {
            throw new RefusedException("the plain-flap correction covers " + range() + "; a flap of chord fraction "
                    + chordFraction + " lies outside it");
        }
    }

    /** The deflection in degrees, refused outside the tables. */
    private double requireCovered(double deflection) {
        if (Double.isNaN(deflection)) {
            throw new IllegalArgumentException("the flap deflection is NaN");
        }
        if (!covers(deflection)) {
            throw new RefusedException("the plain-flap correction covers " + range() + "; a deflection of "
                    + Math.toDegrees(deflection) + " deg lies outside it");
        }
        return Math.max(0, Math.min(MAX_DEFLECTION_DEG, Math.toDegrees(deflection)));
    }
}
