package org.spanlift.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.TextTable;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Wing;
import org.spanlift.washout.TwistDesign;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.washout.WashoutPoint;
import org.spanlift.washout.WashoutRequirement;

/**
 * Parts of {@code spanlift washout}'s outputs: the JSON pieces both of its answers share, and the table and JSON of
 * {@code --twist-stations} (the twist change per station, the total washout and its change to the file's, the
 * onset, and the cruise cost against zero washout and against the least linear washout). Package-private: part of
 * the washout command.
 */
final class WashoutOutput {

    private final Wing wing;
    private final List<WashoutRequirement> requirements;
    private final WashoutDesign.Result linear;
    private final TwistDesign.Result twist;
    private final TwistDesign.Shape shape;
    private final double cruiseCl;
    private final boolean flapsDown;

    WashoutOutput(Wing wing, List<WashoutRequirement> requirements, WashoutDesign.Result linear,
            TwistDesign.Result twist, TwistDesign.Shape shape, double cruiseCl, boolean flapsDown) {
        this.flapsDown = flapsDown;
        this.wing = wing;
        this.requirements = requirements;
        this.linear = linear;
        this.twist = twist;
        this.shape = shape;
        this.cruiseCl = cruiseCl;
    }

    private double semi() {
        return wing.main().planform().yEnd();
    }

    Map<String, Object> json() {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        root.put("units", units());
        Optional<WashoutPoint> at = twist.design();
        root.put("met", twist.met());
        root.put("washout_deg", at.map(p -> (Object) Math.toDegrees(p.washout())).orElse(null));
        root.put("washout_change_deg", at.map(p -> (Object) Math.toDegrees(p.change())).orElse(null));
        root.put("file_washout_deg", Math.toDegrees(wing.main().planform().washout()));
        Map<String, Object> t = new LinkedHashMap<>();
        List<Object> stations = new ArrayList<>();
        double[] knots = shape.knots();
        double[] change = twist.change();
        Planform file = wing.main().planform();
        for (int k = -1; k < knots.length; k++) {
            double y = k < 0 ? file.yStart() : knots[k];
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("y", y);
            m.put("eta", y / semi());
            m.put("file_twist_deg", Math.toDegrees(file.twist(y)));
            if (twist.met()) {
                double c = k < 0 ? 0 : change[k];
                m.put("twist_change_deg", Math.toDegrees(c));
                m.put("twist_deg", Math.toDegrees(file.twist(y) + c));
            } else {
                m.put("twist_change_deg", null);
                m.put("twist_deg", null);
            }
            stations.add(m);
        }
        t.put("stations", stations);
        t.put("bounds_deg", List.of(Math.toDegrees(shape.lower()), Math.toDegrees(shape.upper())));
        t.put("smoothness_deg", Math.toDegrees(shape.smoothness()));
        t.put("from_linear_washout", twist.fromLinear());
        t.put("settled", twist.settled());
        root.put("twist", t);
        List<Object> reqs = new ArrayList<>();
        for (WashoutRequirement q : requirements) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("key", q.key());
            m.put("requirement", q.describe());
            m.put("slack", at.map(p -> (Object) q.slack(p)).orElse(null));
            m.put("slack_unit", q.unit());
            m.put("met", at.map(p -> q.slack(p) >= 0).orElse(false));
            reqs.add(m);
        }
        root.put("requirements", reqs);
        root.put("stall", at.map(p -> (Object) stall(p)).orElse(null));
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("CL", cruiseCl);
        c.put("e", at.map(p -> box(p.cruiseE())).orElse(null));
        c.put("CDi", at.map(p -> (Object) p.cruiseDrag()).orElse(null));
        c.put("e_without_washout", box(twist.unwashed().cruiseE()));
        c.put("CDi_without_washout", twist.unwashed().cruiseDrag());
        c.put("e_linear_washout", twist.linear().map(p -> box(p.cruiseE())).orElse(null));
        c.put("CDi_linear_washout", twist.linear().map(p -> (Object) p.cruiseDrag()).orElse(null));
        root.put("cruise", c);
        Map<String, Object> lin = new LinkedHashMap<>();
        lin.put("met", linear.met());
        lin.put("washout_deg", linear.washout().map(p -> (Object) Math.toDegrees(p.washout())).orElse(null));
        lin.put("washout_change_deg", linear.washout().map(p -> (Object) Math.toDegrees(p.change())).orElse(null));
        lin.put("stall", twist.linear().map(p -> (Object) stall(p)).orElse(null));
        root.put("linear_washout", lin);
        root.put("caution", Cautions.STALL);
        return root;
    }

    String table() {
        StringBuilder b = new StringBuilder(wing.name()).append('\n');
        String asked = String.join("; ", requirements.stream().map(WashoutRequirement::describe).toList());
        b.append(TextTable.wrap("Requirements: " + asked + ".")).append('\n');
        double fileWashout = Math.toDegrees(wing.main().planform().washout());
        double[] knots = shape.knots();
        String unit = wing.displayUnit().symbol();
        double scale = wing.displayUnit().metres();
        b.append('\n').append(TextTable.wrap(String.format(Locale.ROOT, "Twist change of least induced drag at CL %.2f "
                + "meeting them: piecewise linear through %d stations (root unchanged), each change from %.1f to %.1f "
                + "deg, kinks at most %.2f deg.", cruiseCl, knots.length, Math.toDegrees(shape.lower()),
                Math.toDegrees(shape.upper()), Math.toDegrees(shape.smoothness())))).append('\n');
        if (twist.design().isEmpty()) {
            b.append(String.format(Locale.ROOT, "%n  NO twist within these bounds and this smoothness meets them.%n"));
            if (!twist.settled()) {
                b.append(TextTable.wrap(String.format(Locale.ROOT, "(The search did not settle in %d rounds.)",
                        twist.rounds()))).append('\n');
            }
            b.append('\n').append(TextTable.wrap(Cautions.STALL)).append('\n');
            return b.toString();
        }
        WashoutPoint p = twist.design().get();
        b.append(TextTable.wrap(String.format(Locale.ROOT, "Washout (root twist minus tip twist) %.2f deg: the file's "
                + "%.2f deg %+.2f deg.%s", Math.toDegrees(p.washout()), fileWashout, Math.toDegrees(p.change()),
                twist.fromLinear() ? " The least linear washout was the best twist found." : "")
                + (twist.settled() ? "" : String.format(Locale.ROOT, " (The search did not settle in %d rounds; "
                        + "this is the best twist it found that meets them.)", twist.rounds())))).append("\n\n");
        TextTable st = new TextTable(List.of("station y [" + unit + "]", "eta", "file twist [deg]", "change [deg]",
                "twist [deg]"));
        Planform file = wing.main().planform();
        double[] change = twist.change();
        for (int k = -1; k < knots.length; k++) {
            double y = k < 0 ? file.yStart() : knots[k];
            double c = k < 0 ? 0 : change[k];
            st.row(List.of(TextTable.fixed(y / scale, 3), TextTable.fixed(y / semi(), 3),
                    TextTable.fixed(Math.toDegrees(file.twist(y)), 2), TextTable.fixed(Math.toDegrees(c), 2),
                    TextTable.fixed(Math.toDegrees(file.twist(y) + c), 2)));
        }
        b.append(st.render());
        b.append(TextTable.wrap("The change is linear between these stations (and from the root to the first); each "
                + "lies on a strip edge of the wing's lattice, so a wing file given by stations there keeps the same "
                + "lattice and gives these results.")).append("\n\n");
        TextTable req = new TextTable(List.of("requirement", "slack", "met"));
        for (WashoutRequirement q : requirements) {
            req.row(List.of(q.describe(), TextTable.fixed(q.slack(p), 3) + " " + q.unit(), q.slack(p) >= 0 ? "yes"
                    : "NO"));
        }
        b.append(req.render());
        b.append(String.format(Locale.ROOT, "%n  stall onset at CL %.3f, eta %.3f%s%s%n%n", p.onset().lift(),
                p.onset().eta(), p.onset().aileronMargin().map(m -> String.format(Locale.ROOT,
                        ", aileron margin %.3f", m.dcl())).orElse(""), p.stallSpeed().isPresent()
                                ? String.format(Locale.ROOT, ", stall speed %.1f kt EAS (onset)",
                                        Airspeed.knots(p.stallSpeed().getAsDouble())) : ""));
        TextTable cost = new TextTable(List.of("at cruise CL " + TextTable.fixed(cruiseCl, 2), "washout [deg]",
                "onset CL", "aileron margin", "e", "CDi", "CDi change"));
        WashoutPoint zero = twist.unwashed();
        cost.row(row("zero washout", zero, zero));
        twist.linear().ifPresent(l -> cost.row(row("least linear washout", l, zero)));
        cost.row(row("twist distribution", p, zero));
        b.append(cost.render());
        if (flapsDown) {
            b.append(TextTable.wrap("Cruise e and CDi with the flaps up; the onsets with them as asked.")).append('\n');
        }
        twist.linear().ifPresent(l -> b.append(TextTable.wrap(String.format(Locale.ROOT, "Against the least linear "
                + "washout: CDi %+.5f (%+.1f%%).", p.cruiseDrag() - l.cruiseDrag(),
                100 * (p.cruiseDrag() / l.cruiseDrag() - 1)))).append('\n'));
        if (twist.linear().isEmpty()) {
            b.append(TextTable.wrap("No linear washout within --between meets them.")).append('\n');
        }
        b.append('\n').append(TextTable.wrap(Cautions.STALL)).append('\n');
        return b.toString();
    }

    private static List<String> row(String label, WashoutPoint p, WashoutPoint zero) {
        return List.of(label, TextTable.fixed(Math.toDegrees(p.washout()), 2), TextTable.fixed(p.onset().lift(), 3),
                p.onset().aileronMargin().map(m -> TextTable.fixed(m.dcl(), 3)).orElse("-"),
                e(p.cruiseE()), TextTable.fixed(p.cruiseDrag(), 5),
                p == zero ? "-" : String.format(Locale.ROOT, "%+.5f", p.cruiseDrag() - zero.cruiseDrag()));
    }

    /** The units of washout's JSON in a fixed order (a {@code Map.of} changes its order between processes). */
    static Map<String, Object> units() {
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("angle", "deg");
        units.put("length", "m");
        units.put("speed", "m/s");
        return units;
    }

    static Map<String, Object> stall(WashoutPoint p) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("CL", p.onset().lift());
        m.put("y", p.onset().y());
        m.put("eta", p.onset().eta());
        m.put("aileron_margin", p.onset().aileronMargin().map(a -> (Object) Map.of("dcl", a.dcl())).orElse(null));
        m.put("stall_speed_eas", box(p.stallSpeed()));
        p.maximum().ifPresent(x -> {
            m.put("max_lift_CL", x.lift());
            m.put("ailerons_below_peak_at_max_lift", x.aileron().map(a -> (Object) a.belowPeak()).orElse(null));
        });
        return m;
    }

    static Object box(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : null;
    }

    static String e(OptionalDouble e) {
        return e.isPresent() ? TextTable.fixed(e.getAsDouble(), 4) : "-";
    }
}
