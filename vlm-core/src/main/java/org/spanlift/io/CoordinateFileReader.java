package org.spanlift.io;

import org.spanlift.section.CoordinateMeanLine;
import org.spanlift.section.CubicSpline;
import org.spanlift.input.InputException;
import org.spanlift.input.TextFile;
import org.spanlift.input.quantity.Decimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Reads a plain two-column x/y airfoil coordinate file and extracts its mean line.
 *
 * <p>Format: one point per line, x and y separated by spaces, tabs or a comma, in chords. An optional
 * first line gives the section's name (used as its designation; the file name otherwise). Blank lines and
 * comments from {@code #} to the end of a line are ignored. The points either run as one contour (from the
 * trailing edge over one surface round the leading edge and back along the other), or as two blocks, one
 * per surface, each in either direction; a jump of x by more than half a chord separates the blocks.
 *
 * <p>Extraction: the leading edge is the point of minimum x, refined to the point farthest forward along
 * the chord line it defines (the same point unless the section is inclined); the trailing edge is the
 * midpoint of the two surfaces' ends. The coordinates are translated, derotated and scaled to unit chord,
 * split there into the two surfaces, and the mean line is their midpoint at the same x. See
 * {@link CoordinateMeanLine} for the interpolation and for its accuracy near the nose.
 */
public final class CoordinateFileReader {

    /** Fewest coordinate points accepted (both surfaces together). */
    static final int MIN_POINTS = 10;
    /** Accepted raw x range, in chords. */
    static final double X_MIN = -0.1;
    static final double X_MAX = 1.1;
    /** Accepted raw |y|, in chords. */
    static final double Y_LIMIT = 0.5;
    /** The longest section name accepted on the first line. */
    static final int MAX_NAME = 100;
    /** A step in x larger than this (in chords) separates two surface blocks. */
    static final double BLOCK_JUMP = 0.5;
    /** Upper below lower by more than this (in chords) counts as crossing surfaces. */
    static final double CROSSING_TOLERANCE = 5e-5;
    /** Largest accepted distance between the two trailing-edge ends, in chords. */
    static final double MAX_TRAILING_EDGE_GAP = 0.1;

    private static final Pattern NON_FINITE = Pattern.compile("[-+]?(?:nan|inf|infinity)", Pattern.CASE_INSENSITIVE);

    private static final String EXPECT_CONTOUR = "one contour round the leading edge (trailing edge, upper surface, "
            + "leading edge, lower surface, trailing edge) or two surface blocks, one per surface";
    private static final String EXPECT_CHORDS = "coordinates in chords, x from 0 at the leading edge to 1 at the "
            + "trailing edge (x within -0.1 to 1.1, y within -0.5 to 0.5)";

    private CoordinateFileReader() {
    }

    /**
     * Reads a plain two-column x/y airfoil coordinate file and extracts its mean line.
     *
     * @throws InputException with a one-line message naming the file, the line and what is expected
     */
    public static CoordinateMeanLine read(Path file) {
        List<String> lines = TextFile.read(file, "text file of x y section coordinates").lines().toList();
        return parse(file, lines);
    }

    /** A refusal: {@code FILE:LINE: problem; expected what}, or {@code FILE: ...} where no line applies. */
    private static InputException refuse(Path file, int line, String problem, String expected) {
        return new InputException(file.toString(), line, "", problem + "; expected " + expected);
    }

    static CoordinateMeanLine parse(Path file, List<String> lines) {
        String name = null;
        boolean sawContent = false;
        List<double[]> points = new ArrayList<>();
        List<Integer> lineNumbers = new ArrayList<>();
        int lastLine = 0;
        for (int i = 0; i < lines.size(); i++) {
            int lineNo = i + 1;
            String raw = lines.get(i);
            int hash = raw.indexOf('#');
            String text = (hash >= 0 ? raw.substring(0, hash) : raw).strip();
            if (text.isEmpty()) {
                continue;
            }
            String[] tokens = Arrays.stream(text.split("[\\s,;]+")).filter(t -> !t.isEmpty()).toArray(String[]::new);
            double[] values = new double[tokens.length];
            int notNumber = -1;
            for (int k = 0; k < tokens.length && notNumber < 0; k++) {
                if (Decimal.matches(tokens[k])) {
                    values[k] = Double.parseDouble(tokens[k]);
                } else if (NON_FINITE.matcher(tokens[k]).matches()) {
                    values[k] = Double.NaN;
                } else {
                    notNumber = k;
                }
            }
            if (notNumber >= 0) {
                if (!sawContent) {
                    if (text.length() > MAX_NAME) {
                        throw refuse(file, lineNo, "a first line of " + text.length() + " characters that is not a "
                                + "pair of numbers", "the section's name (at most " + MAX_NAME + " characters) or "
                                + "two numbers x y");
                    }
                    name = text;
                    sawContent = true;
                    continue;
                }
                throw refuse(file, lineNo, "value " + (notNumber + 1) + " on the line" + shown(tokens[notNumber])
                        + " is not a number", "two decimal numbers x y per line, such as 0.25 -0.0123 (a name is "
                        + "allowed on the first line only)");
            }
            sawContent = true;
            if (tokens.length == 1) {
                throw refuse(file, lineNo, "only one column (" + tokens[0] + ")", "two columns x y");
            }
            if (tokens.length > 2) {
                throw refuse(file, lineNo, tokens.length + " columns", "two columns x y");
            }
            if (!Double.isFinite(values[0]) || !Double.isFinite(values[1])) {
                throw refuse(file, lineNo,
                        (Double.isFinite(values[0]) ? "y is " + tokens[1] : "x is " + tokens[0]),
                        "finite numbers x y");
            }
            if (values[0] < X_MIN || values[0] > X_MAX) {
                throw refuse(file, lineNo, "x = " + tokens[0] + " is outside -0.1 to 1.1",
                        EXPECT_CHORDS);
            }
            if (Math.abs(values[1]) > Y_LIMIT) {
                throw refuse(file, lineNo, "y = " + tokens[1] + " is outside -0.5 to 0.5",
                        EXPECT_CHORDS);
            }
            int last = points.size() - 1;
            if (last >= 0 && points.get(last)[0] == values[0] && points.get(last)[1] == values[1]) {
                lastLine = lineNo;
                continue; // an exact repeat of the previous point adds nothing
            }
            points.add(values);
            lineNumbers.add(lineNo);
            lastLine = lineNo;
        }
        int n = points.size();
        if (n < MIN_POINTS) {
            throw refuse(file, Math.max(lastLine, lines.size()),
                    "only " + n + " coordinate point" + (n == 1 ? "" : "s") + " in the file",
                    "at least " + MIN_POINTS + " points covering both surfaces");
        }
        double[] x = new double[n];
        double[] y = new double[n];
        int[] ln = new int[n];
        for (int i = 0; i < n; i++) {
            x[i] = points.get(i)[0];
            y[i] = points.get(i)[1];
            ln[i] = lineNumbers.get(i);
        }
        Loop loop = toLoop(file, x, y, ln);
        String designation = name != null ? name : String.valueOf(file.getFileName());
        return extract(file, designation, loop);
    }

    /** Points in one-loop order (trailing edge, one surface, leading edge, other surface, trailing edge). */
    private record Loop(double[] x, double[] y, int[] line) {
    }

    private static Loop toLoop(Path file, double[] x, double[] y, int[] ln) {
        int n = x.length;
        int jump = -1;
        for (int i = 1; i < n; i++) {
            if (Math.abs(x[i] - x[i - 1]) > BLOCK_JUMP) {
                if (jump >= 0) {
                    throw refuse(file, ln[i], "x jumps by more than half a chord a second time",
                            EXPECT_CONTOUR);
                }
                jump = i;
            }
        }
        if (jump < 0) {
            return new Loop(x, y, ln);
        }
        if (jump < 4 || n - jump < 4) {
            throw refuse(file, ln[jump < 4 ? 0 : jump],
                    "a surface block of only " + Math.min(jump, n - jump) + " points",
                    "at least 4 points per surface block");
        }
        // First block ordered trailing edge to leading edge, second leading edge to trailing edge.
        int[] first = range(0, jump, x[0] < x[jump - 1]);
        int[] second = range(jump, n, x[jump] > x[n - 1]);
        int total = first.length + second.length;
        boolean sharedNose = x[first[first.length - 1]] == x[second[0]] && y[first[first.length - 1]] == y[second[0]];
        if (sharedNose) {
            total--;
        }
        double[] lx = new double[total];
        double[] ly = new double[total];
        int[] ll = new int[total];
        int k = 0;
        for (int i : first) {
            lx[k] = x[i];
            ly[k] = y[i];
            ll[k++] = ln[i];
        }
        for (int j = sharedNose ? 1 : 0; j < second.length; j++) {
            int i = second[j];
            lx[k] = x[i];
            ly[k] = y[i];
            ll[k++] = ln[i];
        }
        return new Loop(lx, ly, ll);
    }

    private static int[] range(int from, int to, boolean reversed) {
        int[] r = new int[to - from];
        for (int i = 0; i < r.length; i++) {
            r[i] = reversed ? to - 1 - i : from + i;
        }
        return r;
    }

    private static CoordinateMeanLine extract(Path file, String designation, Loop loop) {
        double[] x = loop.x();
        double[] y = loop.y();
        int[] ln = loop.line();
        int n = x.length;
        double teX = 0.5 * (x[0] + x[n - 1]);
        double teY = 0.5 * (y[0] + y[n - 1]);

        // Leading edge: the point of the contour farthest forward along the chord line from itself to the
        // trailing edge (for a section whose chord lies along x, the point of minimum x). Start from the point
        // of minimum x; in the chord frame fit a parabola xi(eta) through the foremost point and its two
        // neighbours and take its vertex, so that the result depends little on the spacing of the points near
        // the nose; repeat with the new chord line until the point no longer moves.
        int imin = 0;
        for (int i = 1; i < n; i++) {
            if (x[i] < x[imin]) {
                imin = i;
            }
        }
        double leX = x[imin];
        double leY = y[imin];
        double ex = 1.0;
        double ey = 0.0;
        double chord = 1.0;
        int fore = imin;
        double etaVertex = 0.0;
        for (int iter = 0; iter < 100; iter++) {
            double dx = teX - leX;
            double dy = teY - leY;
            chord = Math.hypot(dx, dy);
            ex = dx / chord;
            ey = dy / chord;
            fore = 0;
            double min = Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                double xi = (x[i] - leX) * ex + (y[i] - leY) * ey;
                if (xi < min) {
                    min = xi;
                    fore = i;
                }
            }
            if (fore == 0 || fore == n - 1) {
                throw refuse(file, ln[fore],
                        "no leading edge: the foremost point is an end of the point sequence", EXPECT_CONTOUR);
            }
            double[] xi = new double[3];
            double[] eta = new double[3];
            for (int k = 0; k < 3; k++) {
                int i = fore - 1 + k;
                xi[k] = (x[i] - leX) * ex + (y[i] - leY) * ey;
                eta[k] = -(x[i] - leX) * ey + (y[i] - leY) * ex;
            }
            double xiV = xi[1];
            double etaV = eta[1];
            double h0 = eta[1] - eta[0];
            double h1 = eta[2] - eta[1];
            if (h0 != 0.0 && h1 != 0.0 && Math.signum(h0) == Math.signum(h1)) {
                double d0 = (xi[1] - xi[0]) / h0;
                double d1 = (xi[2] - xi[1]) / h1;
                double c = (d1 - d0) / (eta[2] - eta[0]);
                if (c > 0.0) {
                    double b = d0 - c * (eta[0] + eta[1]);   // xi = a + b eta + c eta^2
                    double e = -b / (2.0 * c);
                    double lo = Math.min(eta[0], eta[2]);
                    double hi = Math.max(eta[0], eta[2]);
                    e = Math.max(lo, Math.min(hi, e));
                    etaV = e;
                    xiV = xi[1] + (e - eta[1]) * (d0 + c * (e - eta[0]));
                    xiV = Math.min(xiV, xi[1]);
                }
            }
            double nx = leX + xiV * ex - etaV * ey;
            double ny = leY + xiV * ey + etaV * ex;
            boolean converged = Math.hypot(nx - leX, ny - leY) < 1e-15 * chord;
            leX = nx;
            leY = ny;
            etaVertex = -(x[fore] - leX) * ey + (y[fore] - leY) * ex;
            if (converged) {
                break;
            }
        }
        // Put the leading edge into the sequence: replace the foremost point if it is (almost) there, otherwise
        // insert it beside the foremost point on the side where the vertex lies.
        double distance = Math.hypot(x[fore] - leX, y[fore] - leY);
        int le;
        if (distance <= 1e-9 * chord) {
            x = x.clone();
            y = y.clone();
            x[fore] = leX;
            y[fore] = leY;
            le = fore;
        } else {
            double etaNext = -(x[fore + 1] - leX) * ey + (y[fore + 1] - leY) * ex;
            // The vertex lies between fore and fore+1 when their eta straddle it (the vertex has eta 0).
            int at = (etaVertex * etaNext < 0.0) ? fore + 1 : fore;
            double[] x2 = new double[n + 1];
            double[] y2 = new double[n + 1];
            int[] l2 = new int[n + 1];
            for (int i = 0, k = 0; i <= n; i++) {
                if (i == at) {
                    x2[i] = leX;
                    y2[i] = leY;
                    l2[i] = ln[fore];
                } else {
                    x2[i] = x[k];
                    y2[i] = y[k];
                    l2[i] = ln[k];
                    k++;
                }
            }
            x = x2;
            y = y2;
            ln = l2;
            n = n + 1;
            le = at;
        }
        double gap = Math.hypot(x[0] - x[n - 1], y[0] - y[n - 1]);
        if (gap > MAX_TRAILING_EDGE_GAP * chord) {
            throw refuse(file, ln[n - 1],
                    String.format(Locale.ROOT, "the two surfaces end %.3g chords apart", gap / chord),
                    "both surfaces to end at the trailing edge");
        }
        double[] xn = new double[n];
        double[] yn = new double[n];
        for (int i = 0; i < n; i++) {
            double dx = x[i] - x[le];
            double dy = y[i] - y[le];
            xn[i] = (dx * ex + dy * ey) / chord;
            yn[i] = (-dx * ey + dy * ex) / chord;
        }
        xn[le] = 0.0;
        yn[le] = 0.0;
        double leXInFile = leX;
        double leYInFile = leY;

        int[] branchA = new int[le + 1];
        for (int i = 0; i <= le; i++) {
            branchA[i] = le - i;
        }
        int[] branchB = new int[n - le];
        for (int i = 0; i < branchB.length; i++) {
            branchB[i] = le + i;
        }
        CubicSpline a = surface(file, branchA, xn, yn, ln);
        CubicSpline b = surface(file, branchB, xn, yn, ln);
        double mean = 0.0;
        for (int k = 1; k <= 19; k++) {
            double s = Math.sqrt(0.05 * k);
            mean += a.value(s) - b.value(s);
        }
        boolean aIsUpper = mean > 0.0;
        CubicSpline upper = aIsUpper ? a : b;
        CubicSpline lower = aIsUpper ? b : a;
        int[] upperIdx = aIsUpper ? branchA : branchB;
        int[] lowerIdx = aIsUpper ? branchB : branchA;
        checkCrossing(file, upperIdx, xn, x, ln, upper, lower);
        checkCrossing(file, lowerIdx, xn, x, ln, upper, lower);
        double chordAngle = Math.atan2(-ey, ex);
        return new CoordinateMeanLine(designation, upper, lower, chord, chordAngle, leXInFile, leYInFile);
    }

    private static CubicSpline surface(Path file, int[] idx, double[] xn, double[] yn, int[] ln) {
        if (idx.length < 4) {
            throw refuse(file, ln[idx[idx.length - 1]],
                    "a surface of only " + idx.length + " points from the leading edge",
                    "at least 4 points per surface");
        }
        double[] s = new double[idx.length];
        double[] v = new double[idx.length];
        for (int k = 0; k < idx.length; k++) {
            int i = idx[k];
            if (k > 0 && !(xn[i] > xn[idx[k - 1]])) {
                throw refuse(file, ln[i],
                        "x does not increase along the surface away from the leading edge",
                        "each surface to run from the leading edge to the trailing edge with x increasing");
            }
            s[k] = Math.sqrt(xn[i]);
            v[k] = yn[i];
        }
        return new CubicSpline(s, v);
    }

    private static void checkCrossing(Path file, int[] idx, double[] xn, double[] xFile, int[] ln,
                                      CubicSpline upper, CubicSpline lower) {
        for (int k = 1; k < idx.length; k++) {
            int i = idx[k];
            double s = Math.sqrt(Math.min(xn[i], 1.0));
            if (upper.value(s) - lower.value(s) < -CROSSING_TOLERANCE) {
                throw refuse(file, ln[i],
                        String.format(Locale.ROOT, "the upper and lower surfaces cross near x = %.4f", xFile[i]),
                        "the upper surface above the lower surface over the whole chord");
            }
        }
    }

    /**
     * A token for a message, quoted, only when it looks like a mistyped number (number characters, at most
     * 20): the file may be any file given by mistake, and its words are not for a message to echo.
     */
    private static String shown(String token) {
        return token.length() <= 20 && token.matches("[-+0-9.eEdDfFxXpP_]+") ? " ('" + token + "')" : "";
    }
}
