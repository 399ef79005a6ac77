package org.spanlift.cli.options;

import java.util.ArrayList;
import java.util.List;

import org.spanlift.input.InputException;

/**
 * Angles of attack in degrees, from a list {@code 0,2,4} or a range {@code from:to:step}, each number in the
 * one angle syntax of {@link Angles}; at most {@value #MAX_POINTS} angles, counted before any is made.
 */
public final class AlphaList {

    /** The angles of a lift curve or polar when none are given, degrees. */
    public static final String DEFAULT_CURVE = "-4:14:1";


    private static final int MAX_POINTS = 1000;

    private AlphaList() {
    }

    public static List<Double> parse(String text) {
        String t = text.trim();
        List<Double> out = new ArrayList<>();
        if (t.contains(":")) {
            String[] p = t.split(":");
            if (p.length != 3) {
                throw bad(text);
            }
            double from = number(p[0], text);
            double to = number(p[1], text);
            double step = number(p[2], text);
            if (step == 0 || (to - from) / step < 0) {
                throw new InputException("--alpha", 0, "", "the step of " + text + " must be non-zero and lead from "
                        + "the first value to the second");
            }
            double count = Math.floor((to - from) / step + 1e-9) + 1;
            if (!(count <= MAX_POINTS)) {
                throw new InputException("--alpha", 0, "", "at most " + MAX_POINTS + " angles, got "
                        + (Double.isFinite(count) && count < 1e15 ? String.valueOf((long) count) : "far more"));
            }
            long n = (long) count;
            for (long i = 0; i < n; i++) {
                out.add(from + i * step);
            }
        } else {
            String[] items = t.split(",", -1);
            if (items.length > MAX_POINTS) {
                throw new InputException("--alpha", 0, "", "at most " + MAX_POINTS + " angles, got " + items.length);
            }
            for (String s : items) {
                out.add(number(s, text));
            }
        }
        for (double a : out) {
            if (Math.abs(a) > 30) {
                throw new InputException("--alpha", 0, "", "angles of attack must lie within -30 to 30 degrees "
                        + "(linear theory), got " + a);
            }
        }
        return out;
    }

    private static double number(String s, String whole) {
        if (!Angles.matches(s)) {
            throw bad(whole);
        }
        String t = s.strip();
        return Double.parseDouble(t.endsWith("deg") ? t.substring(0, t.length() - 3) : t);
    }

    private static InputException bad(String text) {
        String shown = text.length() > 40 ? text.substring(0, 37) + "..." : text;
        return new InputException("--alpha", 0, "", "expected degrees as a list (0,2,4) or a range from:to:step "
                + "(-4:12:2), each a decimal number, got '" + shown + "'");
    }
}
