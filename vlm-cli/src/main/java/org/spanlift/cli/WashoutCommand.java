package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OptionNumber;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.WashoutOptions;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.FigureOutput;
import org.spanlift.cli.plot.Plots;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.washout.LeastDragTwist;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.washout.WashoutPoint;
import org.spanlift.washout.WashoutRequirement;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift washout}: the least washout that meets stall requirements, and what it costs. */
@Command(name = "washout", mixinStandardHelpOptions = true,
        description = {"Find the least washout (root twist minus tip twist, linear from root to tip) that meets "
                + "stall requirements, and what it costs at a cruise CL; with the trade curve of washout against "
                + "the stall onset, the aileron margin and the cruise span efficiency.",
            "Give at least one requirement. For a trapezoid or elliptic wing the answer replaces the file's washout; "
                + "for a wing given by stations a linear twist change is added to the stations' twists."})
public final class WashoutCommand implements Callable<Integer>, OffersFormats {

    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.SVG,
            Format.PNG));

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Mixin
    WashoutOptions washout;

    @Option(names = "--cl", paramLabel = "CL", defaultValue = "0.5",
            description = "The cruise CL of the cost (span efficiency and induced drag). Default: ${DEFAULT-VALUE}.")
    String cruise;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    ClMaxOptions clMax;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        if (format == Format.SVG || format == Format.PNG) {
            FigureOutput.format(output, EnumSet.of(Format.SVG, Format.PNG));
        }
        output.check(InputFiles.wing(file));
        FlightOptions.refuse(spec, "washout finds the stall speed itself; give --weight (and --altitude) for it",
                "--speed", "--true-speed");
        double[] range = washout.bounds();
        double cruiseCl = OptionNumber.parse("--cl", cruise);
        Wing wing = WingFileReader.read(file);
        List<WashoutRequirement> requirements = washout.requirements(wing);
        double[] deflections = org.spanlift.solve.WingAnalysis.of(wing).deflections(flight.deflections(wing));
        Optional<FlightCondition> condition = flight.condition();
        WashoutDesign.Result result;
        try {
            result = WashoutDesign.find(wing, deflections, requirements, cruiseCl, clMax.assumed(), condition,
                    range[0], range[1]);
        } catch (MissingSectionDataException e) {
            throw new InputException(file.toString(), 0, "sections", e.getMessage());
        }
        LeastDragTwist leastDrag = LeastDragTwist.of(org.spanlift.solve.WingAnalysis.of(wing), deflections, cruiseCl);
        switch (format) {
            case JSON -> output.write(Json.write(json(wing, requirements, result, cruiseCl, leastDrag)),
                    spec.commandLine().getOut());
            case SVG, PNG -> FigureOutput.write(Plots.washoutTrade(wing.name(), result, requirements, cruiseCl,
                    FigureContext.of(wing, deflections, condition)), format, output, spec.commandLine().getOut());
            default -> output.write(table(wing, requirements, result, cruiseCl, leastDrag), spec.commandLine().getOut());
        }
        return 0;
    }

    private static Map<String, Object> json(Wing wing, List<WashoutRequirement> requirements,
            WashoutDesign.Result r, double cruiseCl, LeastDragTwist leastDrag) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        root.put("units", Map.of("angle", "deg", "length", "m", "speed", "m/s"));
        WashoutPoint at = r.washout().orElse(r.atUpper());
        root.put("met", r.met());
        root.put("washout_deg", r.washout().map(p -> (Object) Math.toDegrees(p.washout())).orElse(null));
        root.put("washout_change_deg", r.washout().map(p -> (Object) Math.toDegrees(p.change())).orElse(null));
        root.put("file_washout_deg", Math.toDegrees(wing.main().planform().washout()));
        List<Object> reqs = new ArrayList<>();
        for (WashoutRequirement q : requirements) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("key", q.key());
            m.put("requirement", q.describe());
            m.put("slack", q.slack(at));
            m.put("slack_unit", q.unit());
            m.put("met", q.slack(at) >= 0);
            reqs.add(m);
        }
        root.put("requirements", reqs);
        root.put("requirements_read_at_deg", Math.toDegrees(at.washout()));
        root.put("stall", stall(at));
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("CL", cruiseCl);
        c.put("e", box(at.cruiseE()));
        c.put("CDi", at.cruiseDrag());
        c.put("e_without_washout", box(r.unwashed().cruiseE()));
        c.put("CDi_without_washout", r.unwashed().cruiseDrag());
        root.put("cruise", c);
        List<Object> trade = new ArrayList<>();
        for (WashoutPoint p : r.trade()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("washout_deg", Math.toDegrees(p.washout()));
            m.putAll(stall(p));
            m.put("cruise_e", box(p.cruiseE()));
            m.put("cruise_CDi", p.cruiseDrag());
            trade.add(m);
        }
        root.put("trade", trade);
        Map<String, Object> least = new LinkedHashMap<>();
        least.put("e", box(leastDrag.solution().coefficients().spanEfficiency()));
        least.put("CDi", leastDrag.solution().coefficients().inducedDrag());
        double[] tw = leastDrag.twist();
        least.put("washout_deg", Math.toDegrees(tw[0] - tw[tw.length - 1]));
        least.put("y", leastDrag.y());
        double[] deg = new double[tw.length];
        for (int i = 0; i < tw.length; i++) {
            deg[i] = Math.toDegrees(tw[i]);
        }
        least.put("twist_change_deg", deg);
        root.put("least_drag_twist", least);
        root.put("caution", Cautions.stall(wing.surfaces().size()));
        return root;
    }

    private static Map<String, Object> stall(WashoutPoint p) {
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

    private static Object box(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : null;
    }

    private static String table(Wing wing, List<WashoutRequirement> requirements, WashoutDesign.Result r,
            double cruiseCl, LeastDragTwist leastDrag) {
        StringBuilder b = new StringBuilder(wing.name()).append('\n');
        String asked = String.join("; ", requirements.stream().map(WashoutRequirement::describe).toList());
        b.append(TextTable.wrap("Requirements: " + asked + ".")).append('\n');
        double file = Math.toDegrees(wing.main().planform().washout());
        if (r.washout().isPresent()) {
            WashoutPoint p = r.washout().get();
            b.append('\n').append(TextTable.wrap(String.format(Locale.ROOT, "Least washout meeting them: %.2f deg (the "
                    + "file's %.2f deg %+.2f deg; root twist minus tip twist, linear from root to tip; found to %.2f "
                    + "deg).", Math.toDegrees(p.washout()), file, Math.toDegrees(p.change()),
                    WashoutDesign.TOLERANCE_DEG))).append('\n');
        } else {
            b.append(String.format(Locale.ROOT, "%n  NO washout from %.1f to %.1f deg meets them; at %.1f deg:%n%n",
                    Math.toDegrees(r.trade().get(0).washout()), Math.toDegrees(r.atUpper().washout()),
                    Math.toDegrees(r.atUpper().washout())));
        }
        WashoutPoint at = r.washout().orElse(r.atUpper());
        b.append('\n');
        TextTable req = new TextTable(List.of("requirement", "slack", "met"));
        for (WashoutRequirement q : requirements) {
            req.row(List.of(q.describe(), TextTable.fixed(q.slack(at), 3) + " " + q.unit(), q.slack(at) >= 0 ? "yes"
                    : "NO"));
        }
        b.append(req.render());
        b.append(String.format(Locale.ROOT, "%n  stall onset at CL %.3f, eta %.3f%s%s%n", at.onset().lift(),
                at.onset().eta(), at.onset().aileronMargin().map(m -> String.format(Locale.ROOT,
                        ", aileron margin %.3f", m.dcl())).orElse(""), at.stallSpeed().isPresent()
                                ? String.format(Locale.ROOT, ", stall speed %.1f kt EAS (onset)",
                                        Airspeed.knots(at.stallSpeed().getAsDouble())) : ""));
        b.append(String.format(Locale.ROOT, "  cruise at CL %.2f: e %s, CDi %.5f (without washout: e %s, CDi %.5f)%n%n",
                cruiseCl, e(at.cruiseE()), at.cruiseDrag(), e(r.unwashed().cruiseE()), r.unwashed().cruiseDrag()));
        double[] tw = leastDrag.twist();
        b.setLength(b.length() - 1);
        b.append(TextTable.wrap(String.format(Locale.ROOT, "For comparison, the twist of least induced drag at CL %.2f "
                + "(no stall requirement; the elliptic load, Munk): e %s, CDi %.5f, %.2f deg from root to tip (not "
                + "linear; JSON least_drag_twist gives it strip by strip).", cruiseCl,
                e(leastDrag.solution().coefficients().spanEfficiency()), leastDrag.solution().coefficients().inducedDrag(),
                Math.toDegrees(tw[0] - tw[tw.length - 1])))).append("\n\n");
        TextTable t = new TextTable(List.of("washout [deg]", "onset CL", "onset eta", "aileron margin",
                "Vs onset [kt]", "cruise e", "cruise CDi", "meets"));
        for (WashoutPoint p : r.trade()) {
            boolean meets = requirements.stream().allMatch(q -> q.slack(p) >= 0);
            t.row(List.of(TextTable.fixed(Math.toDegrees(p.washout()), 2), TextTable.fixed(p.onset().lift(), 3),
                    TextTable.fixed(p.onset().eta(), 3), p.onset().aileronMargin().map(m -> TextTable.fixed(m.dcl(), 3))
                            .orElse("-"), p.stallSpeed().isPresent() ? TextTable.fixed(Airspeed.knots(
                                    p.stallSpeed().getAsDouble()), 1) : "-", e(p.cruiseE()),
                    TextTable.fixed(p.cruiseDrag(), 5), meets ? "yes" : "no"));
        }
        b.append(t.render());
        b.append('\n').append(TextTable.wrap(Cautions.stall(wing.surfaces().size()))).append('\n');
        return b.toString();
    }

    private static String e(OptionalDouble e) {
        return e.isPresent() ? TextTable.fixed(e.getAsDouble(), 4) : "-";
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
