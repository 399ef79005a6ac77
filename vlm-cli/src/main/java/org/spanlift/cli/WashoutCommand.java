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
import org.spanlift.cli.options.Angles;
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
import org.spanlift.washout.TwistDesign;
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
                + "for a wing given by stations a linear twist change is added to the stations' twists.",
            "With --twist-stations K: instead, the twist change of least cruise induced drag meeting the onset "
                + "requirements, piecewise linear through K stations (root unchanged), within --twist-bounds and "
                + "--smoothness, against zero washout and the least linear washout."})
public final class WashoutCommand implements Callable<Integer>, OffersFormats {

    /** The most twist stations asked for. */
    static final int MAX_TWIST_STATIONS = 16;

    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.SVG,
            Format.PNG));

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Mixin
    WashoutOptions washout;

    @Option(names = "--cl", paramLabel = "CL", defaultValue = "0.5",
            description = "The cruise CL of the cost (span efficiency and induced drag). Default: ${DEFAULT-VALUE}.")
    String cruise;

    @Option(names = "--twist-stations", paramLabel = "K",
            description = "Design a twist distribution instead of a linear washout: a twist change piecewise linear "
                    + "through K stations at even fractions of the semi-span (each on the nearest strip edge), the "
                    + "root's unchanged; 1 to " + MAX_TWIST_STATIONS + ".")
    String twistStations;

    @Option(names = "--twist-bounds", paramLabel = "FROM:TO",
            description = "With --twist-stations: the least and largest twist change at each station, degrees "
                    + "(positive nose-up). Default: -10:10.")
    String twistBounds;

    @Option(names = "--smoothness", paramLabel = "DEG",
            description = "With --twist-stations: the largest kink at an inner station, degrees (the second "
                    + "difference of the changes for even stations). Default: 0.5.")
    String smoothness;

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
        TwistDesign.Shape twistShape = null;
        int stations = 0;
        double[] twistRange = null;
        double kink = 0;
        if (twistStations != null) {
            if (format == Format.SVG || format == Format.PNG) {
                throw new InputException("--format", 0, "", "with --twist-stations, washout writes a table or JSON");
            }
            stations = twistStationCount(twistStations);
            twistRange = twistBounds == null ? new double[] {-10, 10} : range("--twist-bounds", twistBounds);
            kink = smoothness == null ? 0.5 : Angles.parse("--smoothness", smoothness, "a kink", 10);
            if (kink < 0) {
                throw new InputException("--smoothness", 0, "", "expected a kink from 0 to 10 degrees, got "
                        + smoothness.strip());
            }
        } else if (twistBounds != null || smoothness != null) {
            throw new InputException(twistBounds != null ? "--twist-bounds" : "--smoothness", 0, "",
                    "goes with --twist-stations");
        }
        double[] range = washout.bounds();
        double cruiseCl = OptionNumber.parse("--cl", cruise);
        Wing wing = WingFileReader.read(file);
        List<WashoutRequirement> requirements = washout.requirements(wing);
        if (twistStations != null && requirements.stream().anyMatch(WashoutRequirement::needsMaximumLift)) {
            throw new InputException("--ailerons-below-peak", 0, "", "does not go with --twist-stations: the lift at "
                    + "the maximum is not linear in twist; give --onset-inboard-of or --aileron-margin");
        }
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
        if (twistStations != null) {
            twistShape = new TwistDesign.Shape(TwistDesign.evenKnots(wing, stations), Math.toRadians(twistRange[0]),
                    Math.toRadians(twistRange[1]), Math.toRadians(kink));
            TwistDesign.Result twist;
            try {
                twist = TwistDesign.find(wing, deflections, requirements, cruiseCl, clMax.assumed(), condition,
                        twistShape, result.washout());
            } catch (MissingSectionDataException e) {
                throw new InputException(file.toString(), 0, "sections", e.getMessage());
            }
            WashoutOutput out = new WashoutOutput(wing, requirements, result, twist, twistShape, cruiseCl,
                    org.spanlift.stall.StallStudy.anyFlapDeflected(wing, deflections));
            output.write(format == Format.JSON ? Json.write(out.json()) : out.table(), spec.commandLine().getOut());
            return 0;
        }
        switch (format) {
            case JSON -> output.write(Json.write(json(wing, requirements, result, cruiseCl, leastDrag)),
                    spec.commandLine().getOut());
            case SVG, PNG -> FigureOutput.write(Plots.washoutTrade(wing.name(), result, requirements, cruiseCl,
                    FigureContext.of(wing, deflections, condition)), format, output, spec.commandLine().getOut());
            default -> output.write(table(wing, requirements, result, cruiseCl, leastDrag),
                    spec.commandLine().getOut());
        }
        return 0;
    }

    private static Map<String, Object> json(Wing wing, List<WashoutRequirement> requirements,
            WashoutDesign.Result r, double cruiseCl, LeastDragTwist leastDrag) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        root.put("units", WashoutOutput.units());
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
        root.put("stall", WashoutOutput.stall(at));
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("CL", cruiseCl);
        c.put("e", WashoutOutput.box(at.cruiseE()));
        c.put("CDi", at.cruiseDrag());
        c.put("e_without_washout", WashoutOutput.box(r.unwashed().cruiseE()));
        c.put("CDi_without_washout", r.unwashed().cruiseDrag());
        root.put("cruise", c);
        List<Object> trade = new ArrayList<>();
        for (WashoutPoint p : r.trade()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("washout_deg", Math.toDegrees(p.washout()));
            m.putAll(WashoutOutput.stall(p));
            m.put("cruise_e", WashoutOutput.box(p.cruiseE()));
            m.put("cruise_CDi", p.cruiseDrag());
            trade.add(m);
        }
        root.put("trade", trade);
        Map<String, Object> least = new LinkedHashMap<>();
        least.put("e", WashoutOutput.box(leastDrag.solution().coefficients().spanEfficiency()));
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
                cruiseCl, WashoutOutput.e(at.cruiseE()), at.cruiseDrag(), WashoutOutput.e(r.unwashed().cruiseE()),
                r.unwashed().cruiseDrag()));
        double[] tw = leastDrag.twist();
        b.setLength(b.length() - 1);
        b.append(TextTable.wrap(String.format(Locale.ROOT, "For comparison, the twist of least induced drag at CL %.2f "
                + "(no stall requirement; the elliptic load, Munk): e %s, CDi %.5f, %.2f deg from root to tip (not "
                + "linear; JSON least_drag_twist gives it strip by strip).", cruiseCl,
                WashoutOutput.e(leastDrag.solution().coefficients().spanEfficiency()),
                leastDrag.solution().coefficients().inducedDrag(),
                Math.toDegrees(tw[0] - tw[tw.length - 1])))).append("\n\n");
        TextTable t = new TextTable(List.of("washout [deg]", "onset CL", "onset eta", "aileron margin",
                "Vs onset [kt]", "cruise e", "cruise CDi", "meets"));
        for (WashoutPoint p : r.trade()) {
            boolean meets = requirements.stream().allMatch(q -> q.slack(p) >= 0);
            t.row(List.of(TextTable.fixed(Math.toDegrees(p.washout()), 2), TextTable.fixed(p.onset().lift(), 3),
                    TextTable.fixed(p.onset().eta(), 3), p.onset().aileronMargin().map(m -> TextTable.fixed(m.dcl(), 3))
                            .orElse("-"), p.stallSpeed().isPresent() ? TextTable.fixed(Airspeed.knots(
                                    p.stallSpeed().getAsDouble()), 1) : "-", WashoutOutput.e(p.cruiseE()),
                    TextTable.fixed(p.cruiseDrag(), 5), meets ? "yes" : "no"));
        }
        b.append(t.render());
        b.append('\n').append(TextTable.wrap(Cautions.stall(wing.surfaces().size()))).append('\n');
        return b.toString();
    }

    private static int twistStationCount(String text) {
        String t = text.strip();
        if (!t.matches("[0-9]{1,3}") || Integer.parseInt(t) < 1 || Integer.parseInt(t) > MAX_TWIST_STATIONS) {
            String shown = t.length() > 20 ? t.substring(0, 17) + "..." : t;
            throw new InputException("--twist-stations", 0, "", "expected a whole number of stations from 1 to "
                    + MAX_TWIST_STATIONS + ", got '" + shown + "'");
        }
        return Integer.parseInt(t);
    }

    private static double[] range(String option, String text) {
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new InputException(option, 0, "", "expected FROM:TO in degrees, such as -10:10, got '"
                    + (text.length() > 40 ? text.substring(0, 37) + "..." : text.strip()) + "'");
        }
        double from = Angles.parse(option, parts[0], "a twist change", 20);
        double to = Angles.parse(option, parts[1], "a twist change", 20);
        if (!(to >= from)) {
            throw new InputException(option, 0, "", "expected FROM no larger than TO, got '" + text.strip() + "'");
        }
        return new double[] {from, to};
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
