package org.spanlift.section;

import java.util.Locale;

/**
 * Builds section contours from a mean line and the NACA four-digit thickness distribution (Jacobs, Ward and
 * Pinkerton, NACA Report 460, 1933), used also by the 230-series sections (NACA Report 537):
 * <pre>
 *   y_t = 5 t (0.2969 sqrt(x) - 0.1260 x - 0.3516 x^2 + 0.2843 x^3 + a4 x^4),
 * </pre>
 * with a4 = -0.1015 as published in Report 460 (a trailing edge of finite thickness, y_t(1) = 0.0105 t) or
 * a4 = -0.1036, a common modification that closes the trailing edge (y_t(1) = 0). The thickness is laid normal to
 * the mean line: with theta = atan(dz/dx), the upper surface is (x - y_t sin theta, z + y_t cos theta) and the lower
 * (x + y_t sin theta, z - y_t cos theta).
 */
public final class SectionCoordinates {

    private SectionCoordinates() {
    }

    /** The trailing-edge form of the thickness distribution. */
    public enum TrailingEdge {
        /** Report 460 as published: a4 = -0.1015, finite trailing-edge thickness. */
        OPEN(-0.1015),
        /** Common modification: a4 = -0.1036, closed trailing edge. */
        CLOSED(-0.1036);

        private final double a4;

        TrailingEdge(double a4) {
            this.a4 = a4;
        }

        /** The x^4 coefficient. */
        public double a4() {
            return a4;
        }
    }

    /**
     * A section contour in one-loop order: from the trailing edge over the upper surface to the leading edge and
     * back along the lower surface. Coordinates in chords.
     */
    public static final class Contour {
        private final String name;
        private final double[] x;
        private final double[] y;
        private final int stations;

        Contour(String name, double[] x, double[] y, int stations) {
            this.name = name;
            this.x = x;
            this.y = y;
            this.stations = stations;
        }

        /** The section's name. */
        public String name() {
            return name;
        }

        /** Number of points (2 stations + 1). */
        public int size() {
            return x.length;
        }

        /** x of point i. */
        public double x(int i) {
            return x[i];
        }

        /** y of point i. */
        public double y(int i) {
            return y[i];
        }

        /** The file text in one-loop order, name on the first line, eight decimals. */
        public String toText() {
            StringBuilder sb = new StringBuilder(name).append('\n');
            for (int i = 0; i < x.length; i++) {
                appendPoint(sb, i);
            }
            return sb.toString();
        }

        /**
         * The file text as two blocks (upper, then lower, each from leading to trailing edge), a blank line between.
         */
        public String toTwoBlockText() {
            StringBuilder sb = new StringBuilder(name).append('\n');
            for (int i = stations; i >= 0; i--) {
                appendPoint(sb, i);
            }
            sb.append('\n');
            for (int i = stations; i < x.length; i++) {
                appendPoint(sb, i);
            }
            return sb.toString();
        }

        private void appendPoint(StringBuilder sb, int i) {
            sb.append(String.format(Locale.ROOT, "%.8f %.8f%n", x[i], y[i]));
        }
    }

    /** Half thickness y_t at chord fraction x for thickness ratio t. */
    public static double halfThickness(double t, double x, TrailingEdge trailingEdge) {
        return 5.0 * t * (0.2969 * Math.sqrt(x) + x * (-0.1260 + x * (-0.3516 + x * (0.2843 + x * trailingEdge.a4()))));
    }

    /**
     * Contour of a NACA four-digit or 230-series section given by designation, its thickness from the
     * designation.
     */
    public static Contour naca(String designation, int stations, TrailingEdge trailingEdge) {
        CamberLine line = CamberLines.parse(designation);
        double t;
        if (line instanceof NacaFourDigit four) {
            t = four.thickness();
        } else if (line instanceof NacaFiveDigit five) {
            t = five.thickness();
        } else {
            throw new IllegalArgumentException("section '" + designation
                    + "' has no thickness; expected a NACA designation");
        }
        return build(line, t, stations, trailingEdge);
    }

    /**
     * Contour of any mean line with the Report 460 thickness distribution of ratio {@code thickness}, at
     * {@code stations} + 1 cosine-spaced mean-line stations x_i = (1 - cos(pi i / stations)) / 2.
     */
    public static Contour build(CamberLine meanLine, double thickness, int stations, TrailingEdge trailingEdge) {
        if (stations < 4) {
            throw new IllegalArgumentException("at least 4 stations per surface, got " + stations);
        }
        if (!(thickness > 0.0 && thickness < 0.5)) {
            throw new IllegalArgumentException("thickness must be between 0 and 0.5 chords, got " + thickness);
        }
        int n = 2 * stations + 1;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i <= stations; i++) {
            double xc = 0.5 * (1.0 - Math.cos(Math.PI * i / stations));
            if (i == stations) {
                xc = 1.0;
            }
            double yt = halfThickness(thickness, xc, trailingEdge);
            double theta = Math.atan(meanLine.slope(xc));
            double zc = meanLine.z(xc);
            double sin = Math.sin(theta);
            double cos = Math.cos(theta);
            x[stations - i] = xc - yt * sin;
            y[stations - i] = zc + yt * cos;
            x[stations + i] = xc + yt * sin;
            y[stations + i] = zc - yt * cos;
        }
        return new Contour(meanLine.designation(), x, y, stations);
    }
}
