package org.spanlift.sweep;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.spanlift.vocabulary.Need;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;

/**
 * A sweep's result column: a key of the {@link Vocabulary}, with {@code @CL=0.5} or {@code @alpha=4} for a
 * value taken at a wing CL or an angle of attack (degrees), {@code stall.} or {@code stall_flaps.} before a
 * stall-onset key, {@code controls.NAME.} before a control's key, and {@code loads.} before a key of the
 * sweep's load case ({@code loads.root.bending}). SI units, angles in degrees, as in the
 * JSON outputs. An unknown name is refused, never defaulted.
 *
 * @param name     the column name as written
 * @param group    the vocabulary group the key belongs to, and for an onset which configuration
 * @param key      the vocabulary key
 * @param control  the control named by a {@code controls.NAME.*} column, else null
 * @param atLift   for a point column: true at a CL, false at an angle of attack
 * @param at       for a point column: the CL, or the angle of attack in degrees
 */
public record ResultColumn(String name, Group group, ResultKey<?> key, String control, boolean atLift, double at) {

    /** Where a column's value comes from. */
    public enum Group {
        /** {@link Vocabulary#WING}. */
        WING,
        /** {@link Vocabulary#POINT}, at a CL or an angle of attack. */
        POINT,
        /** {@link Vocabulary#ONSET} of the clean configuration. */
        STALL,
        /** {@link Vocabulary#ONSET} with the flaps deflected. */
        STALL_FLAPS,
        /** {@link Vocabulary#MAX_LIFT} of the clean configuration. */
        MAX_LIFT,
        /** {@link Vocabulary#MAX_LIFT} with the flaps deflected. */
        MAX_LIFT_FLAPS,
        /** {@link Vocabulary#STUDY}: flap increment, stall speeds, the assumed-cl_max flag. */
        STUDY,
        /** {@link Vocabulary#CONTROL}. */
        CONTROL,
        /** {@link Vocabulary#LOADS} of the sweep's load case, under {@link Vocabulary#LOAD_CASE}. */
        LOADS,
        /** {@link Vocabulary#BALANCE} at the sweep's centre of gravity, under {@link Vocabulary#BALANCE_PREFIX}. */
        BALANCE
    }

    /** The flag column added when a sweep assumes cl-max for sections that give none. */
    public static final String ASSUMED_CL_MAX = "assumed_cl_max";

    private static final Pattern POINT =
            Pattern.compile("(.+)@(CL|alpha)=([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)");
    private static final Pattern CONTROL = Pattern.compile("controls\\.([^.]+)\\.([^.]+)");

    /** A bad column name. */
    public static final class ColumnException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ColumnException(String message) {
            super(message);
        }
    }

    /** True for a key that {@link Vocabulary#POINT} declares (taken at a flight point). */
    public static boolean isPointKey(String name) {
        return Vocabulary.lookup(Vocabulary.POINT, name).isPresent();
    }

    /**
     * Parses a column name.
     *
     * @param controls the base wing's control names, for {@code controls.NAME.*}
     * @throws ColumnException saying what is expected
     */
    public static ResultColumn parse(String name, List<String> controls) {
        String n = name.trim();
        List<String> pointKeys = Vocabulary.names(Vocabulary.POINT);
        Matcher p = POINT.matcher(n);
        if (p.matches()) {
            String key = p.group(1);
            ResultKey<?> k = Vocabulary.lookup(Vocabulary.POINT, key).orElseThrow(() -> new ColumnException("'" + key
                    + "' is not a value taken at a flight point; with @CL= or @alpha= use one of "
                    + String.join(", ", pointKeys)));
            boolean atLift = p.group(2).equals("CL");
            double at = Double.parseDouble(p.group(3));
            if (!atLift && Math.abs(at) > 30) {
                throw new ColumnException("angles of attack must lie within -30 to 30 degrees (linear theory), got "
                        + at);
            }
            if (atLift && Math.abs(at) > 4) {
                throw new ColumnException("a target CL must lie within -4 to 4, got " + at);
            }
            return new ResultColumn(n, Group.POINT, k, null, atLift, at);
        }
        if (n.contains("@")) {
            throw new ColumnException("expected KEY@CL=NUMBER or KEY@alpha=NUMBER (degrees), got '" + n + "'");
        }
        if (isPointKey(n)) {
            throw new ColumnException("'" + n + "' is taken at a flight point: write " + n + "@CL=0.5 or " + n
                    + "@alpha=4, or list the points under 'points'");
        }
        var wing = Vocabulary.lookup(Vocabulary.WING, n);
        if (wing.isPresent()) {
            return new ResultColumn(n, Group.WING, wing.get(), null, false, 0);
        }
        var study = Vocabulary.lookup(Vocabulary.STUDY, n);
        if (study.isPresent()) {
            return new ResultColumn(n, Group.STUDY, study.get(), null, false, 0);
        }
        for (String prefix : List.of(Vocabulary.CLEAN, Vocabulary.FLAPS)) {
            if (n.startsWith(prefix)) {
                String rest = n.substring(prefix.length());
                ResultKey<?> k = Vocabulary.lookup(Vocabulary.ONSET, rest).orElseThrow(() -> new ColumnException(
                        "unknown stall result '" + rest + "'; expected " + prefix + " followed by one of "
                                + String.join(", ", Vocabulary.names(Vocabulary.ONSET))));
                return new ResultColumn(n, prefix.equals(Vocabulary.CLEAN) ? Group.STALL : Group.STALL_FLAPS, k, null,
                        false, 0);
            }
        }
        for (String prefix : List.of(Vocabulary.MAX_CLEAN, Vocabulary.MAX_FLAPS)) {
            if (n.startsWith(prefix)) {
                String rest = n.substring(prefix.length());
                ResultKey<?> k = Vocabulary.lookup(Vocabulary.MAX_LIFT, rest).orElseThrow(() -> new ColumnException(
                        "unknown maximum-lift result '" + rest + "'; expected " + prefix + " followed by one of "
                                + String.join(", ", Vocabulary.names(Vocabulary.MAX_LIFT))));
                return new ResultColumn(n, prefix.equals(Vocabulary.MAX_CLEAN) ? Group.MAX_LIFT : Group.MAX_LIFT_FLAPS,
                        k, null, false, 0);
            }
        }
        if (n.startsWith(Vocabulary.LOAD_CASE)) {
            String rest = n.substring(Vocabulary.LOAD_CASE.length());
            ResultKey<?> k = Vocabulary.lookup(Vocabulary.LOADS, rest).orElseThrow(() -> new ColumnException(
                    "unknown load-case result '" + rest + "'; expected " + Vocabulary.LOAD_CASE + " followed by one of "
                            + String.join(", ", Vocabulary.names(Vocabulary.LOADS))));
            return new ResultColumn(n, Group.LOADS, k, null, false, 0);
        }
        if (n.startsWith(Vocabulary.BALANCE_PREFIX)) {
            String rest = n.substring(Vocabulary.BALANCE_PREFIX.length());
            ResultKey<?> k = Vocabulary.lookup(Vocabulary.BALANCE, rest).orElseThrow(() -> new ColumnException(
                    "unknown balance result '" + rest + "'; expected " + Vocabulary.BALANCE_PREFIX
                            + " followed by one of "
                            + String.join(", ", Vocabulary.names(Vocabulary.BALANCE))));
            return new ResultColumn(n, Group.BALANCE, k, null, false, 0);
        }
        Matcher c = CONTROL.matcher(n);
        if (c.matches()) {
            if (!controls.contains(c.group(1))) {
                throw new ColumnException("the base wing has no control named '" + c.group(1) + "'; it has "
                        + (controls.isEmpty() ? "none" : String.join(", ", controls)));
            }
            ResultKey<?> k = Vocabulary.lookup(Vocabulary.CONTROL, c.group(2)).orElseThrow(() -> new ColumnException(
                    "unknown control value '" + c.group(2) + "'; expected one of "
                            + String.join(", ", Vocabulary.names(Vocabulary.CONTROL))));
            return new ResultColumn(n, Group.CONTROL, k, c.group(1), false, 0);
        }
        throw new ColumnException("unknown result '" + n + "'; expected one of "
                + String.join(", ", Vocabulary.names(Vocabulary.WING)) + "; a point value ("
                + String.join(", ", pointKeys) + ") with @CL= or @alpha=; stall.* or stall_flaps.* ("
                + String.join(", ", Vocabulary.names(Vocabulary.ONSET)) + "); max_lift.* or max_lift_flaps.* ("
                + String.join(", ", Vocabulary.names(Vocabulary.MAX_LIFT)) + "); "
                + String.join(", ", Vocabulary.names(Vocabulary.STUDY)) + "; controls.NAME.* ("
                + String.join(", ", Vocabulary.names(Vocabulary.CONTROL)) + "); loads.* ("
                + String.join(", ", Vocabulary.names(Vocabulary.LOADS)) + "); balance.* ("
                + String.join(", ", Vocabulary.names(Vocabulary.BALANCE)) + ")");
    }

    /** True for columns that need section cl-max data. */
    public boolean needsClMax() {
        return key.needs(Need.CL_MAX);
    }

    /** True for columns of the flapped configuration. */
    public boolean needsFlaps() {
        return group == Group.STALL_FLAPS || group == Group.MAX_LIFT_FLAPS || key.needs(Need.FLAPS);
    }

    /** True for columns of the sweep's load case ({@code loads.*}). */
    public boolean needsLoadCase() {
        return group == Group.LOADS;
    }

    /** True for columns of the balance at the sweep's centre of gravity ({@code balance.*}). */
    public boolean needsCentreOfGravity() {
        return key.needs(Need.CG);
    }

    /** True for columns that need a weight (stall speeds). */
    public boolean needsWeight() {
        return key.needs(Need.WEIGHT);
    }
}
