package org.spanlift.cli;

import java.nio.file.Path;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.plot.Figure;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.FigureOutput;
import org.spanlift.cli.plot.PlotKind;
import org.spanlift.cli.plot.Plots;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallStudy;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift plot}: one figure of one wing, as SVG or PNG. */
@Command(name = "plot", mixinStandardHelpOptions = true,
        description = {"Draw one figure of a wing as SVG or PNG: its planform and lattice, its span load, its lift "
                + "curve, its drag polar or its stall map.",
            "Every figure states the configuration it was drawn for under its title: each deflected control (degrees, "
                + "trailing edge down) and, with --weight, the weight, the pressure altitude and the load factor "
                + "when it is not 1. Where the sections give cl-max data (or --assume-cl-max is given), the "
                + "critical-section stall onset of that configuration is marked on the planform and the lift "
                + "curve, and the span load draws each station's cl_max beside its cl."})
public final class PlotCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.SVG, Format.PNG));

    /** The lift coefficient of the span load when no angle is given. */
    static final double DEFAULT_CL = 0.5;

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Option(names = {"-w", "--what"}, paramLabel = "KIND", required = true,
            description = "What to draw: planform (outline, lattice, controls, stall-onset station), span-load "
                    + "(c cl, cl and, with cl-max data, cl_max along the span, against the elliptic load), lift (CL "
                    + "against alpha, stall onset marked), polar (CL against CDi, and CD with section polars) or "
                    + "stall (the stall map: section cl at stall onset and cl_max along the span, ailerons, deflected "
                    + "flaps and fuselage shaded).")
    String what;

    @Option(names = {"-a", "--alpha"}, paramLabel = "DEG",
            description = "span-load: the angle of attack in degrees (default: the angle where CL = 0.5). lift and "
                    + "polar: the angles, a list 0,2,4 or a range from:to:step (default " + AlphaList.DEFAULT_CURVE
                    + ").")
    String alpha;

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
        PlotKind kind = PlotKind.parse(what);
        Format format = FigureOutput.format(output, FORMATS);
        output.check(InputFiles.wing(file));
        Wing wing = WingFileReader.read(file);
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] deflections = analysis.deflections(flight.deflections(wing));
        Optional<FlightCondition> condition = flight.condition();
        FigureContext context = FigureContext.of(wing, deflections, condition);
        Figure figure = switch (kind) {
            case PLANFORM -> Plots.planform(analysis, estimate(analysis, deflections, condition)
                    .map(e -> OptionalDouble.of(e.y())).orElse(OptionalDouble.empty()), context);
            case SPAN_LOAD -> Plots.spanLoad(analysis, analysis.solve(spanLoadAlpha(analysis, deflections),
                    deflections), estimate(analysis, deflections, condition), context);
            case LIFT -> liftCurve(analysis, deflections, condition, context);
            case POLAR -> Plots.polar(analysis, deflections, range(), flight.reynoldsRule(wing), context);
            case STALL -> stallMap(analysis, deflections, condition, context);
        };
        FigureOutput.write(figure, format, output, spec.commandLine().getOut());
        return 0;
    }

    /**
     * The stall-onset estimate of the configuration drawn, when the sections allow one (every section gives
     * cl-max, or --assume-cl-max is given): it marks the planform and the lift curve and gives the span load
     * its cl_max line.
     */
    private Optional<StallEstimate> estimate(WingAnalysis analysis, double[] deflections,
            Optional<FlightCondition> condition) {
        try {
            return Optional.of(StallStudy.configuration("plot", analysis, deflections, clMax.assumed(), condition)
                    .estimate());
        } catch (MissingSectionDataException e) {
            return Optional.empty();
        }
    }

    /**
     * The lift curve; where the sections allow a stall estimate, with the onset and the lift through the
     * stall (the angles then run to the end of the traced curve unless --alpha is given).
     */
    private Figure liftCurve(WingAnalysis analysis, double[] deflections, Optional<FlightCondition> condition,
            FigureContext context) {
        Optional<StallStudy.Configuration> c;
        try {
            c = Optional.of(StallStudy.configuration("plot", analysis, deflections, clMax.assumed(), condition));
        } catch (MissingSectionDataException e) {
            c = Optional.empty();
        }
        Optional<MaximumLift> maximum = c.flatMap(StallStudy.Configuration::maximumLiftIfAny);
        List<Double> angles = range();
        if (alpha == null && maximum.isPresent()) {
            List<MaximumLift.CurvePoint> curve = maximum.get().curve();
            double end = Math.ceil(Math.toDegrees(curve.get(curve.size() - 1).alpha()));
            angles = AlphaList.parse("-4:" + (long) Math.max(14, end) + ":1");
        }
        return Plots.liftCurve(analysis, deflections, angles, c.map(StallStudy.Configuration::estimate), maximum,
                context);
    }

    /** The stall map, with the section cl at maximum lift and past it from the section lift curves. */
    private Figure stallMap(WingAnalysis analysis, double[] deflections, Optional<FlightCondition> condition,
            FigureContext context) {
        StallStudy.Configuration c;
        try {
            c = StallStudy.configuration("plot", analysis, deflections, clMax.assumed(), condition);
        } catch (MissingSectionDataException e) {
            throw new InputException(file.toString(), 0, "sections", e.getMessage());
        }
        return Plots.stallMap(analysis, c.estimate(), c.maximumLiftIfAny(), context);
    }

    private double spanLoadAlpha(WingAnalysis analysis, double[] deflections) {
        if (alpha == null) {
            return analysis.liftCurve(deflections).alphaFor(DEFAULT_CL);
        }
        List<Double> one = AlphaList.parse(alpha);
        if (one.size() != 1) {
            throw new InputException("--alpha", 0, "", "the span load takes one angle of attack, got " + one.size());
        }
        return Math.toRadians(one.get(0));
    }

    private List<Double> range() {
        List<Double> list = AlphaList.parse(alpha == null ? AlphaList.DEFAULT_CURVE : alpha);
        if (list.size() < 2) {
            throw new InputException("--alpha", 0, "", "a curve needs at least two angles of attack");
        }
        return list;
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
