package org.spanlift.section;

import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Factory for camber lines: designations and coordinate files. */
public final class CamberLines {

    /** What {@link #parse(String)} accepts, as stated in its error messages. */
    public static final String ACCEPTED = "flat, NACA MPTT (four-digit, e.g. NACA 2412 or NACA 0012) or "
            + "NACA 2P0TT with P 1 to 5 (230-series family, e.g. NACA 23012); case and the space after NACA are free";

    private static final Pattern NACA = Pattern.compile("naca\\s*(\\S*)", Pattern.CASE_INSENSITIVE);

    private CamberLines() {
    }

    /**
     * Parses a camber-line designation: {@code flat}, {@code NACA 2412}, {@code NACA2412}, {@code naca 23012}.
     *
     * @throws IllegalArgumentException with a one-line message saying what is accepted
     */
    public static CamberLine parse(String spec) {
        if (spec == null || spec.isBlank()) {
            throw new IllegalArgumentException("camber line missing; accepted: " + ACCEPTED);
        }
        String s = spec.strip();
        if (s.equalsIgnoreCase("flat")) {
            return FlatPlate.INSTANCE;
        }
        Matcher m = NACA.matcher(s);
        if (!m.matches()) {
            throw refuse(s, "unknown camber line");
        }
        String digits = m.group(1);
        if (!digits.matches("\\d+")) {
            throw refuse(s, "NACA must be followed by four or five digits");
        }
        int[] d = digits.chars().map(c -> c - '0').toArray();
        try {
            if (d.length == 4) {
                return new NacaFourDigit(d[0], d[1], 10 * d[2] + d[3]);
            }
            if (d.length == 5) {
                if (d[0] != 2) {
                    throw refuse(s, "design lift digit " + d[0] + " (cl "
                            + String.format(Locale.ROOT, "%.2f", 0.15 * d[0])
                            + ") is not provided, only 2 (cl 0.3)");
                }
                if (d[2] != 0) {
                    throw refuse(s, "reflexed mean lines (third digit 1) are not provided");
                }
                return new NacaFiveDigit(d[1], 10 * d[3] + d[4]);
            }
        } catch (IllegalArgumentException e) {
            if (e.getMessage() != null && e.getMessage().contains("accepted: ")) {
                throw e;
            }
            throw refuse(s, e.getMessage());
        }
        throw refuse(s, "NACA must be followed by four or five digits, found " + d.length);
    }

    private static IllegalArgumentException refuse(String spec, String problem) {
        return new IllegalArgumentException("camber line '" + spec + "': " + problem + "; accepted: " + ACCEPTED);
    }
}
