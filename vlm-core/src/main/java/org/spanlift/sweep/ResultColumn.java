package org.spanlift.sweep;

import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A named scalar result of a case, by its key path in the {@code solve} or {@code stall} JSON output
 * ({@code lift_slope_per_rad}, {@code stall.eta}, {@code stall_speed.clean_eas}), with {@code @CL=0.5} or
 * {@code @alpha=4} for a value taken at a wing CL or an angle of attack (degrees), and control ends
 * ({@code controls.aileron.from_eta}). SI units, angles in degrees, as in the JSON outputs.
 *
 * @param name     the column name as written
 * @param key      the key without the point suffix
 * @param group    what must be computed for it
 * @param control  the control named by a {@code controls.NAME.*} column, else null
 * @param atLift   for a point column: true at a CL, false at an angle of attack
 * @param at       for a point column: the CL, or the angle of attack in degrees
 */
public record ResultColumn(String name, String key, Group group, String control, boolean atLift, double at) {

    /** What a column needs computed. */
    public enum Group {
        /** Lift slope, zero-lift angle, reference values: no section data needed. */
        WING,
        /** A value at one flight point (CL or alpha). */
        POINT,
        /** Clean stall onset; needs cl-max. */
        STALL,
        /** Stall onset with the flaps deflected; needs cl-max. */
        STALL_FLAPS,
        /** Stall speeds; need cl-max and a weight. */
        STALL_SPEED,
        /** A control's geometry. */
        CONTROL,
        /** A yes/no flag (assumed_cl_max). */
        FLAG
    }

    /** The flag column added when a sweep assumes cl-max for sections that give none. */
    public static final String ASSUMED_CL_MAX = "assumed_cl_max";

    static final List<String> WING_KEYS = List.of("lift_slope_per_rad", "lift_slope_per_deg", "zero_lift_angle_deg",
            "reference.area", "reference.span", "reference.chord", "reference.aspect_ratio", "lattice.panels");
    public static final List<String> POINT_KEYS = List.of("CL", "CDi", "e", "Cm", "C_roll", "alpha_deg");
    static final List<String> STALL_KEYS = List.of("CL", "alpha_deg", "y", "eta", "aileron_margin.dcl",
            "aileron_margin.y", "half_span_CL", "beside_control_end");
    static final List<String> SPEED_KEYS = List.of("clean_eas", "clean_tas", "flaps_eas", "flaps_tas");
    static final List<String> CONTROL_KEYS = List.of("from", "to", "from_eta", "to_eta", "chord_fraction",
            "deflection_deg");

    private static final Pattern POINT = Pattern.compile("(.+)@(CL|alpha)=([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)");
    private static final Pattern CONTROL = Pattern.compile("controls\\.([^.]+)\\.([^.]+)");

    /** A bad column name. */
    public static final class ColumnException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ColumnException(String message) {
            super(message);
        }
    }

    /**
     * Parses a column name.
     *
     * @param controls the base wing's control names, for {@code controls.NAME.*}
     * @throws ColumnException saying what is expected
     */
    public static ResultColumn parse(String name, List<String> controls) {
        String n = name.trim();
        Matcher p = POINT.matcher(n);
        if (p.matches()) {
            String key = p.group(1);
            if (!POINT_KEYS.contains(key)) {
                throw new ColumnException("'" + key + "' is not a value taken at a flight point; with @CL= or @alpha= "
                        + "use one of " + String.join(", ", POINT_KEYS));
            }
            boolean atLift = p.group(2).equals("CL");
            double at = Double.parseDouble(p.group(3));
            if (!atLift && Math.abs(at) > 30) {
                throw new ColumnException("angles of attack must lie within -30 to 30 degrees (linear theory), got " + at);
            }
            if (atLift && Math.abs(at) > 4) {
                throw new ColumnException("a target CL must lie within -4 to 4, got " + at);
            }
            return new ResultColumn(n, key, Group.POINT, null, atLift, at);
        }
        if (n.contains("@")) {
            throw new ColumnException("expected KEY@CL=NUMBER or KEY@alpha=NUMBER (degrees), got '" + n + "'");
        }
        if (POINT_KEYS.contains(n)) {
            throw new ColumnException("'" + n + "' is taken at a flight point: write " + n + "@CL=0.5 or " + n
                    + "@alpha=4, or list the points under 'points'");
        }
        if (WING_KEYS.contains(n)) {
            return new ResultColumn(n, n, Group.WING, null, false, 0);
        }
        if (n.equals(ASSUMED_CL_MAX)) {
            return new ResultColumn(n, n, Group.FLAG, null, false, 0);
        }
        if (n.equals("flap_increment_CL")) {
            return new ResultColumn(n, n, Group.STALL_FLAPS, null, false, 0);
        }
        for (Map.Entry<String, Group> prefix : Map.of("stall.", Group.STALL, "stall_flaps.", Group.STALL_FLAPS)
                .entrySet()) {
            if (n.startsWith(prefix.getKey())) {
                String rest = n.substring(prefix.getKey().length());
                if (!STALL_KEYS.contains(rest)) {
                    throw new ColumnException("unknown stall result '" + rest + "'; expected " + prefix.getKey()
                            + "followed by one of " + String.join(", ", STALL_KEYS));
                }
                return new ResultColumn(n, n, prefix.getValue(), null, false, 0);
            }
        }
        if (n.startsWith("stall_speed.")) {
            String rest = n.substring("stall_speed.".length());
            if (!SPEED_KEYS.contains(rest)) {
                throw new ColumnException("unknown stall speed '" + rest + "'; expected one of "
                        + String.join(", ", SPEED_KEYS));
            }
            return new ResultColumn(n, n, Group.STALL_SPEED, null, false, 0);
        }
        Matcher c = CONTROL.matcher(n);
        if (c.matches()) {
            if (!controls.contains(c.group(1))) {
                throw new ColumnException("the base wing has no control named '" + c.group(1) + "'; it has "
                        + (controls.isEmpty() ? "none" : String.join(", ", controls)));
            }
            if (!CONTROL_KEYS.contains(c.group(2))) {
                throw new ColumnException("unknown control value '" + c.group(2) + "'; expected one of "
                        + String.join(", ", CONTROL_KEYS));
            }
            return new ResultColumn(n, c.group(2), Group.CONTROL, c.group(1), false, 0);
        }
        throw new ColumnException("unknown result '" + n + "'; expected one of " + String.join(", ", WING_KEYS)
                + "; a point value (" + String.join(", ", POINT_KEYS) + ") with @CL= or @alpha=; stall.* or stall_flaps.* ("
                + String.join(", ", STALL_KEYS) + "); flap_increment_CL; stall_speed.* (" + String.join(", ", SPEED_KEYS)
                + "); controls.NAME.* (" + String.join(", ", CONTROL_KEYS) + ")");
    }

    /** True for columns that need section cl-max data. */
    public boolean needsClMax() {
        return group == Group.STALL || group == Group.STALL_FLAPS || group == Group.STALL_SPEED;
    }
}
