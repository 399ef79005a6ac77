package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Coefficients;
import org.spanlift.results.Solution;
import org.spanlift.results.SpanLoad;
import org.spanlift.solve.WingAnalysis;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift solve}: coefficients and span loads of one wing over a list of angles of attack. */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Solve a wing over angles of attack: CL, induced drag, span efficiency, moments, span load.")
public final class SolveCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Option(names = {"-a", "--alpha"}, paramLabel = "LIST", defaultValue = "-4:12:2",
            description = "Angles of attack in degrees: a list 0,2,4 or a range from:to:step. Default: ${DEFAULT-VALUE}.")
    String alpha;

    @Option(names = "--span-load", paramLabel = "FILE.csv",
            description = "Also write the per-strip span load of every angle to this CSV file (SI units).")
    Path spanLoadFile;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Spec
    CommandSpec spec;

    private static final String UNITS_NOTE = "circulation is Gamma/V in m";

    @Override
    public Integer call() {
        Format format = output.format(EnumSet.of(Format.TABLE, Format.JSON, Format.CSV));
        List<Double> alphas = AlphaList.parse(alpha);
        Wing wing = WingFileReader.read(file);
        Map<String, Double> overrides = flight.deflections(wing);
        WingAnalysis analysis = WingAnalysis.of(wing);
        double[] deflections = analysis.deflections(overrides);
        List<Solution> points = new ArrayList<>();
        for (double a : alphas) {
            points.add(analysis.solve(Math.toRadians(a), deflections));
        }
        WingAnalysis.LiftLine line = analysis.liftLine(deflections);
        String text = switch (format) {
            case JSON -> Json.write(json(wing, analysis, line, points));
            case CSV -> csv(points);
            default -> table(wing, analysis, line, points);
        };
        String loads = spanLoadFile == null ? null : spanLoadCsv(wing, points);
        output.write(text, spec.commandLine().getOut());
        if (loads != null) {
            OutputOptions.writeAtomically(spanLoadFile, loads.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        }
        return 0;
    }

    private static Map<String, Object> json(Wing wing, WingAnalysis analysis, WingAnalysis.LiftLine line,
            List<Solution> points) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("angle", "deg unless the key says rad");
        units.put("circulation", "m (Gamma/V)");
        root.put("units", units);
        Reference r = wing.reference();
        Map<String, Object> ref = new LinkedHashMap<>();
        ref.put("area", r.area());
        ref.put("span", r.span());
        ref.put("chord", r.chord());
        ref.put("aspect_ratio", r.aspectRatio());
        ref.put("moment_point", new double[] {r.momentPoint().x(), r.momentPoint().y(), r.momentPoint().z()});
        root.put("reference", ref);
        root.put("lattice", latticeJson(analysis));
        root.put("lift_slope_per_rad", line.slope());
        root.put("lift_slope_per_deg", line.slope() * Math.PI / 180);
        root.put("zero_lift_angle_deg", Math.toDegrees(line.zeroLiftAngle()));
        root.put("deflections_deg", deflectionsJson(wing, points.isEmpty() ? null : points.get(0)));
        List<Object> list = new ArrayList<>();
        for (Solution s : points) {
            Coefficients c = s.coefficients();
            Map<String, Object> p = new LinkedHashMap<>();
            p.put("alpha_deg", Math.toDegrees(s.alpha()));
            p.put("CL", c.lift());
            p.put("CDi", c.inducedDrag());
            p.put("e", c.spanEfficiency());
            p.put("Cm", c.pitchingMoment());
            p.put("C_roll", c.rollingMoment());
            p.put("span_load", spanLoadJson(s.spanLoad(0)));
            if (wing.surfaces().size() > 1) {
                List<Object> surfaces = new ArrayList<>();
                for (int k = 0; k < wing.surfaces().size(); k++) {
                    Map<String, Object> one = new LinkedHashMap<>();
                    one.put("name", wing.surfaces().get(k).name());
                    one.put("CL", s.coefficients(k).lift());
                    one.put("span_load", spanLoadJson(s.spanLoad(k)));
                    surfaces.add(one);
                }
                p.put("surfaces", surfaces);
            }
            list.add(p);
        }
        root.put("points", list);
        return root;
    }

    static Map<String, Object> latticeJson(WingAnalysis analysis) {
        Map<String, Object> lat = new LinkedHashMap<>();
        lat.put("panels", analysis.lattice().panelCount());
        lat.put("strips", analysis.lattice().strips().size());
        lat.put("unknowns", analysis.lattice().mirrored() ? analysis.lattice().halfCount()
                : analysis.lattice().panelCount());
        lat.put("solve", analysis.lattice().mirrored() ? "half span, symmetric and antisymmetric" : "full span");
        return lat;
    }

    private static Map<String, Object> deflectionsJson(Wing wing, Solution s) {
        Map<String, Object> d = new LinkedHashMap<>();
        List<ControlSurface> controls = wing.controls();
        for (int i = 0; i < controls.size(); i++) {
            d.put(controls.get(i).name(), s == null ? Math.toDegrees(controls.get(i).deflection())
                    : Math.toDegrees(s.deflection(i)));
        }
        return d;
    }

    private static Map<String, Object> spanLoadJson(SpanLoad l) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("y", l.y());
        m.put("chord", l.chord());
        m.put("cl", l.cl());
        m.put("cl_c", l.clc());
        m.put("circulation", l.circulation());
        double[] deg = new double[l.size()];
        for (int i = 0; i < deg.length; i++) {
            deg[i] = Math.toDegrees(l.inducedAngle()[i]);
        }
        m.put("induced_angle_deg", deg);
        return m;
    }

    private static String csv(List<Solution> points) {
        Csv csv = new Csv(List.of("alpha_deg", "CL", "CDi", "e", "Cm", "C_roll"));
        for (Solution s : points) {
            Coefficients c = s.coefficients();
            csv.row(Math.toDegrees(s.alpha()), c.lift(), c.inducedDrag(),
                    c.spanEfficiency().isPresent() ? c.spanEfficiency().getAsDouble() : null, c.pitchingMoment(),
                    c.rollingMoment());
        }
        return csv.toString();
    }

    private static String spanLoadCsv(Wing wing, List<Solution> points) {
        Csv csv = new Csv(List.of("alpha_deg", "surface", "y_m", "chord_m", "cl", "cl_c_m", "circulation_m",
                "induced_angle_deg"));
        for (Solution s : points) {
            for (int k = 0; k < wing.surfaces().size(); k++) {
                SpanLoad l = s.spanLoad(k);
                for (int i = 0; i < l.size(); i++) {
                    csv.row(Math.toDegrees(s.alpha()), wing.surfaces().get(k).name(), l.y()[i], l.chord()[i], l.cl()[i],
                            l.clc()[i], l.circulation()[i], Math.toDegrees(l.inducedAngle()[i]));
                }
            }
        }
        return csv.toString();
    }

    private static String table(Wing wing, WingAnalysis analysis, WingAnalysis.LiftLine line, List<Solution> points) {
        String u = wing.displayUnit().symbol();
        double k = wing.displayUnit().metres();
        Reference r = wing.reference();
        StringBuilder b = new StringBuilder();
        b.append(wing.name()).append('\n');
        b.append(String.format(java.util.Locale.ROOT,
                "  reference    area %.3f %s^2, span %.3f %s, chord %.3f %s, aspect ratio %.3f%n", r.area() / (k * k), u,
                r.span() / k, u, r.chord() / k, u, r.aspectRatio()));
        b.append(String.format(java.util.Locale.ROOT, "  moments about (%.3f, %.3f, %.3f) %s%n",
                r.momentPoint().x() / k, r.momentPoint().y() / k, r.momentPoint().z() / k, u));
        int panels = analysis.lattice().panelCount();
        b.append(String.format(java.util.Locale.ROOT, "  lattice      %d panels in %d strips, %d unknowns (%s)%n", panels,
                analysis.lattice().strips().size(), analysis.lattice().mirrored() ? analysis.lattice().halfCount() : panels,
                analysis.lattice().mirrored() ? "half-span symmetric solve" : "full-span solve"));
        b.append(String.format(java.util.Locale.ROOT,
                "  lift slope   %.4f per rad (%.5f per deg) at zero lift; zero-lift angle %.3f deg%n", line.slope(),
                line.slope() * Math.PI / 180, Math.toDegrees(line.zeroLiftAngle())));
        if (!wing.controls().isEmpty()) {
            List<String> d = new ArrayList<>();
            List<ControlSurface> controls = wing.controls();
            for (int i = 0; i < controls.size(); i++) {
                double deg = points.isEmpty() ? 0 : Math.toDegrees(points.get(0).deflection(i));
                d.add(controls.get(i).name() + " " + TextTable.fixed(deg, 1) + " deg");
            }
            b.append("  controls     ").append(String.join(", ", d)).append(" (trailing edge down; aileron: right side)\n");
        }
        b.append('\n');
        List<String> headers = new ArrayList<>(List.of("alpha [deg]", "CL", "CDi", "e", "Cm", "C_roll"));
        boolean several = wing.surfaces().size() > 1;
        if (several) {
            wing.surfaces().forEach(s -> headers.add("CL " + s.name()));
        }
        TextTable t = new TextTable(headers);
        for (Solution s : points) {
            Coefficients c = s.coefficients();
            List<String> row = new ArrayList<>(List.of(TextTable.fixed(Math.toDegrees(s.alpha()), 2),
                    TextTable.fixed(c.lift(), 4), TextTable.fixed(c.inducedDrag(), 5),
                    c.spanEfficiency().isPresent() ? TextTable.fixed(c.spanEfficiency().getAsDouble(), 4) : "-",
                    TextTable.fixed(c.pitchingMoment(), 4), TextTable.fixed(c.rollingMoment(), 5)));
            if (several) {
                for (int k2 = 0; k2 < wing.surfaces().size(); k2++) {
                    row.add(TextTable.fixed(s.coefficients(k2).lift(), 4));
                }
            }
            t.row(row);
        }
        b.append(t.render());
        b.append("\n  e is shown only where |CL| >= 0.05. CDi from the Trefftz plane. Cm positive nose-up; C_roll\n"
                + "  positive right wing down, on the reference span. Use --format json for span loads.\n");
        return b.toString();
    }
}
