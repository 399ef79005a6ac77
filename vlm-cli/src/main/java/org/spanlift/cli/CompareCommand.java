package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.CommonLift;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.cli.report.ComparePage;
import org.spanlift.cli.report.Comparison;
import org.spanlift.cli.report.WingSummary;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.RefusedException;
import org.spanlift.io.StructureReader;
import org.spanlift.io.WingFileReader;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallStudy;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.cli.options.WashoutOptions;
import org.spanlift.stall.StripLimits;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.WingStructure;


import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift compare}: several wings side by side, as a table or an HTML page. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = "Compare wings side by side: area, span, aspect ratio, MAC, lift slope, zero-lift angle, e and "
                + "CDi at a common CL; with section cl_max the stall onset clean and with flaps and the aileron "
                + "margin; with --weight the stall speeds; with --speed as well, the root shear and bending of that "
                + "load case. With the differences from the first wing; as a table, JSON, CSV or an HTML page with "
                + "the planforms and span loads overlaid.")
public final class CompareCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.CSV,
            Format.HTML));

    private static final int MAX_WINGS = 12;

    @Parameters(arity = "2..*", paramLabel = "FILE", description = "Two or more wing files; the first is the base.")
    List<Path> files;

    @Option(names = "--cl", paramLabel = "CL", defaultValue = "0.5",
            description = "The common lift coefficient of e, CDi and the span loads. Default: ${DEFAULT-VALUE}.")
    String commonLift;

    /** The common CL, read from {@link #commonLift}. */
    private double cl;

    @Option(names = "--range", paramLabel = "FROM:TO:STEP", defaultValue = AlphaList.DEFAULT_CURVE,
            description = "Angles of the lift curves on the HTML page, degrees. Default: ${DEFAULT-VALUE}.")
    String range;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    ClMaxOptions clMax;

    @Mixin
    UnitsOption units;

    @Mixin
    WashoutOptions washout;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        output.check(InputFiles.wings(files));
        units.check(format);
        if (files.size() > MAX_WINGS) {
            throw new InputException("compare", 0, "", "at most " + MAX_WINGS + " wings at once, got " + files.size());
        }
        cl = CommonLift.parse(commonLift);
        List<Double> curve = AlphaList.parse(range);
        // Stall speeds are the 1 g ones; the load factor belongs to the load case of the root loads.
        AtmosphereState atmosphere = flight.atmosphere();
        Optional<FlightCondition> condition = flight.condition()
                .map(fc -> new FlightCondition(fc.weight(), 1, atmosphere, OptionalDouble.empty()));
        OptionalDouble speed = flight.equivalentSpeed(atmosphere);
        if (speed.isPresent() && condition.isEmpty()) {
            throw new InputException("--speed", 0, "", "the speed sets the load case of the root loads, which also "
                    + "needs --weight (and --load-factor, default 1)");
        }
        if (speed.isEmpty()) {
            FlightOptions.refuse(spec, "the load factor belongs to the load case of the root loads; give --speed too "
                    + "(stall speeds are at 1 g)", "--load-factor");
        }
        Optional<LoadCase> loadCase = speed.isPresent()
                ? Optional.of(new LoadCase(String.format(Locale.ROOT, "n %.2f at %.1f m/s EAS", flight.loadFactor(),
                        speed.getAsDouble()), condition.get().weight(), flight.loadFactor(), speed.getAsDouble(),
                        atmosphere.pressureAltitude(), "given"))
                : Optional.empty();
        List<String> labels = new ArrayList<>();
        List<Comparison.Entry> entries = new ArrayList<>();
        for (int i = 0; i < files.size(); i++) {
            entries.add(entry(files.get(i), condition, loadCase));
            labels.add(String.valueOf((char) ('A' + i)));
        }
        Comparison cmp = new Comparison(labels, entries, cl, condition, loadCase, flight.flapsDeg());
        DisplayUnits u = units.units(entries.get(0).summary().wing().displayUnit());
        String text = switch (format) {
            case JSON -> Json.write(cmp.json(Cautions.COMPARISON));
            case CSV -> csv(cmp);
            case HTML -> ComparePage.build(cmp, curve, u, new VersionProvider().getVersion()[0]);
            default -> table(cmp, u);
        };
        output.write(text, spec.commandLine().getOut());
        return 0;
    }

    /**
     * One wing: its aerodynamics at the common CL clean, its stall study with the asked deflections (as
     * {@code stall} gives it) and the load case's loads clean (as {@code loads} gives them).
     */
    private Comparison.Entry entry(Path file, Optional<FlightCondition> condition, Optional<LoadCase> loadCase) {
        Wing wing = WingFileReader.read(file);
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] asked = analysis.deflections(flight.deflections(wing));
        double[] clean = StallStudy.cleanDeflections(wing, asked);
        if (!(Math.abs(cl) < analysis.liftCurve(clean).slope())) {
            throw new InputException(file.toString(), 0, "", "CL " + cl + " is beyond this wing's linear range");
        }
        WingSummary summary = WingSummary.of(file, wing, analysis, clean, cl);
        List<String> notes = new ArrayList<>();
        Optional<StallStudy> stall = Optional.empty();
        try {
            stall = Optional.of(StallStudy.of(analysis, asked, clMax.assumed(), condition));
            if (stall.get().assumedClMax()) {
                notes.add("cl_max assumed for sections that give none (--assume-cl-max)");
            }
        } catch (RefusedException e) {
            notes.add("no stall results: " + e.getMessage());
        }
        Optional<SpanwiseLoads> loads = Optional.empty();
        if (loadCase.isPresent()) {
            if (!wing.main().mirrored()) {
                notes.add("no root loads: loads are computed per half-wing and the first surface is not mirrored");
            } else {
                WingStructure structure = StructureReader.read(file, wing);
                if (structure == WingStructure.NONE) {
                    notes.add("no structure section: root loads are the air load alone, without inertia relief");
                }
                try {
                    LoadsAnalysis la = LoadsAnalysis.of(analysis, structure, clean);
                    SpanwiseLoads l = la.loads(loadCase.get());
                    OptionalDouble onset = stall.isPresent() ? OptionalDouble.of(la.stallOnsetLift(loadCase.get(),
                            StripLimits.of(wing, analysis.lattice(), clean, clMax.assumed()))) : OptionalDouble.empty();
                    if (onset.isPresent() && LoadsAnalysis.beyondStall(l, onset.getAsDouble())) {
                        notes.add(String.format(Locale.ROOT, "no root loads: the load case needs a wing CL of %.3f, "
                                + "above the stall onset %.3f: it cannot be flown at that speed (spanlift loads "
                                + "--beyond-stall computes it)", l.liftCoefficient(), onset.getAsDouble()));
                    } else {
                        loads = Optional.of(l);
                    }
                } catch (RefusedException e) {
                    notes.add("no root loads: " + e.getMessage());
                }
            }
        }
        Optional<WashoutDesign.Result> washoutAnswer = Optional.empty();
        if (washout.asked()) {
            double[] bounds = washout.bounds();
            try {
                washoutAnswer = Optional.of(WashoutDesign.find(wing, clean, washout.requirements(wing), cl,
                        clMax.assumed(), condition, bounds[0], bounds[1]));
            } catch (RefusedException e) {
                notes.add("no washout answer: " + e.getMessage());
            }
        }
        return new Comparison.Entry(summary, stall, loads, washoutAnswer, notes);
    }

    private static String csv(Comparison cmp) {
        List<String> header = new ArrayList<>(List.of("quantity", "unit"));
        header.addAll(cmp.labels());
        for (int i = 1; i < cmp.labels().size(); i++) {
            header.add(cmp.labels().get(i) + "-" + cmp.labels().get(0));
        }
        Csv csv = new Csv(header);
        for (Comparison.Row r : cmp.rows()) {
            List<Object> cells = new ArrayList<>(List.of(r.key(), r.unit(DisplayUnits.si())));
            for (int i = 0; i < cmp.entries().size(); i++) {
                cells.add(boxed(cmp.value(r, i)));
            }
            for (int i = 1; i < cmp.entries().size(); i++) {
                cells.add(boxed(cmp.difference(r, i)));
            }
            csv.row(cells.toArray());
        }
        return csv.toString();
    }

    private static Double boxed(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : null;
    }

    private static String table(Comparison cmp, DisplayUnits u) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cmp.entries().size(); i++) {
            WingSummary w = cmp.entries().get(i).summary();
            b.append("  ").append(cmp.labels().get(i)).append("  ").append(w.wing().name())
                    .append(" (").append(w.file()).append(")\n");
        }
        b.append(ComparePage.conditionText(cmp, u).isEmpty() ? "" : "  " + ComparePage.conditionText(cmp, u) + "\n")
                .append('\n');
        List<String> header = new ArrayList<>(List.of("quantity", "unit"));
        header.addAll(cmp.labels());
        for (int i = 1; i < cmp.labels().size(); i++) {
            header.add(cmp.labels().get(i) + "-" + cmp.labels().get(0));
        }
        TextTable t = new TextTable(header);
        for (Comparison.Row r : cmp.rows()) {
            List<String> row = new ArrayList<>(List.of(r.label(), r.unit(u)));
            for (int i = 0; i < cmp.entries().size(); i++) {
                OptionalDouble v = cmp.value(r, i);
                row.add(v.isPresent() ? TextTable.fixed(r.display(v.getAsDouble(), u), r.decimals()) : "-");
            }
            for (int i = 1; i < cmp.entries().size(); i++) {
                OptionalDouble v = cmp.difference(r, i);
                row.add(v.isPresent() ? signed(TextTable.fixed(r.display(v.getAsDouble(), u), r.decimals())) : "-");
            }
            t.row(row);
        }
        b.append(t.render());
        b.append(String.format(Locale.ROOT, "%n  Common CL %.3f, every flap at zero there. Lengths in %s; each "
                + "wing on its own reference values; CDi is induced drag only.%n", cmp.cl(), u.length().symbol()));
        for (int i = 0; i < cmp.entries().size(); i++) {
            for (String note : cmp.entries().get(i).notes()) {
                b.append("  ").append(cmp.labels().get(i)).append(": ").append(note).append('\n');
            }
        }
        if (cmp.bearsOnSafety()) {
            b.append('\n').append(TextTable.wrap(Cautions.COMPARISON)).append('\n');
        }
        return b.toString();
    }

    private static String signed(String s) {
        return s.startsWith("-") ? s : "+" + s;
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
