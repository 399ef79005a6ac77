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

import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.StallSpeed;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StripLimits;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift stall}: where and at what lift the wing starts to stall, clean and with flaps, and the stall speeds. */
@Command(name = "stall", mixinStandardHelpOptions = true,
        description = "Stall onset by the critical-section method: station, CL, aileron margin, spread; stall speeds.")
public final class StallCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON));

    static final String CAUTION = "Caution: an estimate from linear theory and section data for the wing alone (the "
            + "tail's download, which raises the real stall speed, is not included); not a substitute for flight "
            + "test, airworthiness standards or licensed engineering judgement.";

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Mixin
    ClMaxOptions clMax;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        Wing wing = WingFileReader.read(file);
        Map<String, Double> overrides = flight.deflections(wing);
        Optional<FlightCondition> condition = flight.condition();
        AtmosphereState atmosphere = flight.atmosphere();
        WingAnalysis analysis = WingAnalysis.of(wing);
        double[] asked = analysis.deflections(overrides);
        double[] clean = asked.clone();
        double[] flapped = asked.clone();
        boolean anyFlap = false;
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            if (controls.get(c).kind() == ControlKind.FLAP) {
                clean[c] = 0;
                anyFlap |= flapped[c] != 0;
            }
        }
        OptionalDouble assumed = clMax.assumed();
        Config cleanResult;
        Config flapResult;
        try {
            cleanResult = evaluate("clean", analysis, clean, assumed, condition);
            flapResult = anyFlap ? evaluate("flaps", analysis, flapped, assumed, condition) : null;
        } catch (MissingSectionDataException e) {
            throw new InputException(file.toString(), 0, "sections", e.getMessage());
        }
        String text = format == Format.JSON
                ? Json.write(json(wing, cleanResult, flapResult, condition, atmosphere))
                : table(wing, cleanResult, flapResult, condition, atmosphere);
        output.write(text, spec.commandLine().getOut());
        return 0;
    }

    /** One configuration's stall estimate and, with a weight, its stall speed. */
    record Config(String label, double[] deflections, StallEstimate estimate, Optional<StallSpeed> speed) {
    }

    /**
     * The stall estimate of one configuration: at the stall speed's Reynolds numbers with a flight condition,
     * else with cl-max tables read at their lowest Reynolds number.
     *
     * @throws MissingSectionDataException when a section has no cl-max and none is assumed
     */
    static Config evaluate(String label, WingAnalysis analysis, double[] deflections, OptionalDouble assumed,
            Optional<FlightCondition> condition) {
        StripLimits limits = StripLimits.of(analysis.wing(), analysis.lattice(), deflections, assumed);
        if (condition.isPresent()) {
            StallSpeed s = StallSpeed.of(analysis, deflections, limits, condition.get());
            return new Config(label, deflections, s.estimate(), Optional.of(s));
        }
        return new Config(label, deflections, StallAnalysis.estimate(analysis, deflections, limits, 0), Optional.empty());
    }

    private static Map<String, Object> stallJson(Config c) {
        StallEstimate e = c.estimate();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("CL", e.lift());
        m.put("alpha_deg", Math.toDegrees(e.alpha()));
        m.put("y", e.y());
        m.put("eta", e.eta());
        m.put("section", e.section());
        m.put("section_alpha_deg", Math.toDegrees(onsetStrip(e).sectionAngle()));
        m.put("aileron_margin", e.aileronMargin().map(a -> {
            Map<String, Object> am = new LinkedHashMap<>();
            am.put("dcl", a.dcl());
            am.put("y", Math.abs(a.y()));
            return (Object) am;
        }).orElse(null));
        m.put("half_span_CL", e.halfSpanLift());
        m.put("assumed_cl_max", e.assumedClMax());
        m.put("default_flap_increment", e.defaultFlapIncrement());
        m.put("beside_control_end", e.besideControlEnd().map(end -> {
            Map<String, Object> em = new LinkedHashMap<>();
            em.put("control", end.control());
            em.put("y", end.y());
            em.put("first_on_control", end.firstOnControl().map(f -> {
                Map<String, Object> fm = new LinkedHashMap<>();
                fm.put("CL", f.lift());
                fm.put("y", Math.abs(f.y()));
                return (Object) fm;
            }).orElse(null));
            return (Object) em;
        }).orElse(null));
        m.put("method", "critical section, linear theory");
        List<StallEstimate.StripStall> right = e.strips().stream().filter(s -> s.y() > 0).toList();
        Map<String, Object> spread = new LinkedHashMap<>();
        spread.put("y", right.stream().mapToDouble(StallEstimate.StripStall::y).toArray());
        spread.put("eta", right.stream().mapToDouble(StallEstimate.StripStall::eta).toArray());
        spread.put("reynolds", right.stream().mapToDouble(StallEstimate.StripStall::reynolds).toArray());
        spread.put("cl_max", right.stream().mapToDouble(StallEstimate.StripStall::clMax).toArray());
        spread.put("cl_at_onset", right.stream().mapToDouble(StallEstimate.StripStall::clAtOnset).toArray());
        spread.put("cl_basic", right.stream().mapToDouble(StallEstimate.StripStall::clBasic).toArray());
        spread.put("cl_additional", right.stream().mapToDouble(StallEstimate.StripStall::clAdditional).toArray());
        spread.put("section_alpha_deg", right.stream().mapToDouble(s -> Math.toDegrees(s.sectionAngle())).toArray());
        List<Object> reach = new ArrayList<>();
        right.forEach(s -> reach.add(s.liftToReach()));
        spread.put("CL_reaching_cl_max", reach);
        m.put("strips", spread);
        return m;
    }

    private static Map<String, Object> json(Wing wing, Config clean, Config flaps, Optional<FlightCondition> condition,
            AtmosphereState atmosphere) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("speed", "m/s");
        units.put("density", "kg/m^3");
        units.put("temperature", "K");
        units.put("pressure", "Pa");
        units.put("force", "N");
        units.put("altitude", "m, pressure altitude (geopotential, standard atmosphere)");
        root.put("units", units);
        Map<String, Object> ref = new LinkedHashMap<>();
        ref.put("area", wing.reference().area());
        ref.put("span", wing.reference().span());
        root.put("reference", ref);
        Map<String, Object> atm = new LinkedHashMap<>();
        atm.put("pressure_altitude", atmosphere.pressureAltitude());
        atm.put("density", atmosphere.density());
        atm.put("temperature", atmosphere.temperature());
        atm.put("pressure", atmosphere.pressure());
        root.put("atmosphere", atm);
        root.put("fuselage_half_width", wing.main().fuselageHalfWidth());
        root.put("stall", stallJson(clean));
        if (flaps != null) {
            Map<String, Object> f = stallJson(flaps);
            f.put("deflections_deg", deflections(wing, flaps.deflections()));
            root.put("stall_flaps", f);
            root.put("flap_increment_CL", flaps.estimate().lift() - clean.estimate().lift());
        }
        condition.ifPresent(fc -> {
            Map<String, Object> sp = new LinkedHashMap<>();
            sp.put("clean_eas", clean.speed().orElseThrow().equivalent());
            sp.put("clean_tas", clean.speed().orElseThrow().trueSpeed());
            if (flaps != null) {
                sp.put("flaps_eas", flaps.speed().orElseThrow().equivalent());
                sp.put("flaps_tas", flaps.speed().orElseThrow().trueSpeed());
            }
            sp.put("weight", fc.weight());
            sp.put("load_factor", fc.loadFactor());
            root.put("stall_speed", sp);
        });
        root.put("caution", CAUTION);
        return root;
    }

    private static Map<String, Object> deflections(Wing wing, double[] d) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < d.length; i++) {
            m.put(wing.controls().get(i).name(), Math.toDegrees(d[i]));
        }
        return m;
    }

    private static String table(Wing wing, Config clean, Config flaps, Optional<FlightCondition> condition,
            AtmosphereState atmosphere) {
        String u = wing.displayUnit().symbol();
        double k = wing.displayUnit().metres();
        StringBuilder b = new StringBuilder(wing.name()).append('\n');
        b.append("  stall onset by the critical-section method (linear theory)\n");
        double fuselage = wing.main().fuselageHalfWidth();
        if (fuselage > 0) {
            b.append(String.format(Locale.ROOT, "  stations inside the fuselage (|y| < %.3f %s) are not stall candidates%n",
                    fuselage / wing.displayUnit().metres(), wing.displayUnit().symbol()));
        }
        if (condition.isPresent()) {
            b.append(String.format(Locale.ROOT, "  pressure altitude %.0f m (geopotential), density %.4f kg/m^3, %.2f K%n",
                    atmosphere.pressureAltitude(), atmosphere.density(), atmosphere.temperature()));
        }
        b.append('\n');
        List<Config> configs = new ArrayList<>(List.of(clean));
        if (flaps != null) {
            configs.add(flaps);
        }
        List<String> headers = new ArrayList<>(List.of("", "clean"));
        if (flaps != null) {
            headers.add("flaps");
        }
        TextTable t = new TextTable(headers);
        t.row(cells("wing CL at onset", configs, c -> TextTable.fixed(c.estimate().lift(), 3)));
        t.row(cells("alpha at onset [deg]", configs, c -> TextTable.fixed(Math.toDegrees(c.estimate().alpha()), 2)));
        t.row(cells("onset station y [" + u + "]", configs, c -> TextTable.fixed(c.estimate().y() / k, 3)));
        t.row(cells("onset station eta", configs, c -> TextTable.fixed(c.estimate().eta(), 3)));
        t.row(cells("section there", configs, c -> c.estimate().section()));
        t.row(cells("  its angle of attack [deg]", configs, c -> TextTable.fixed(Math.toDegrees(onsetStrip(c.estimate())
                .sectionAngle()), 2)));
        t.row(cells("aileron margin dcl", configs, c -> c.estimate().aileronMargin()
                .map(a -> TextTable.fixed(a.dcl(), 3)).orElse("-")));
        t.row(cells("  at y [" + u + "]", configs, c -> c.estimate().aileronMargin()
                .map(a -> TextTable.fixed(Math.abs(a.y()) / k, 3)).orElse("-")));
        t.row(cells("CL with half span at cl_max", configs, c -> c.estimate().halfSpanLift().isPresent()
                ? TextTable.fixed(c.estimate().halfSpanLift().getAsDouble(), 3) : "-"));
        if (condition.isPresent()) {
            t.row(cells("stall speed EAS [kt]", configs, c -> TextTable.fixed(c.speed().orElseThrow().equivalent() * 3600 / 1852, 1)));
            t.row(cells("stall speed TAS [kt]", configs, c -> TextTable.fixed(c.speed().orElseThrow().trueSpeed() * 3600 / 1852, 1)));
            t.row(cells("stall speed EAS [m/s]", configs, c -> TextTable.fixed(c.speed().orElseThrow().equivalent(), 2)));
        }
        b.append(t.render());
        if (flaps != null) {
            b.append(String.format(Locale.ROOT, "%n  flaps raise the stall-onset CL by %.3f%n",
                    flaps.estimate().lift() - clean.estimate().lift()));
        }
        for (Config c : configs) {
            c.estimate().besideControlEnd().ifPresent(end -> b.append('\n').append(wrap(String.format(Locale.ROOT,
                    "NOTE (%s): stall starts beside the end of the %s at y = %.3f %s. Linear theory concentrates a "
                            + "deflected control's lift in a peak at its ends, narrower than the chord, so this "
                            + "onset depends on the lattice (finer strips resolve more of the peak and lower it) and "
                            + "is pessimistic: read it as a sign that "
                            + "the %s end may stall early. %s", c.label(), end.control(), end.y() / k, u,
                    end.control(), end.firstOnControl().map(f -> String.format(Locale.ROOT, "On the %s itself the "
                            + "first station reaches cl_max at CL %.3f (y = %.3f %s), a value that settles as the "
                            + "lattice is refined.", end.control(), f.lift(), Math.abs(f.y()) / k, u))
                            .orElse("No station on the " + end.control() + " itself reaches cl_max."))))
                    .append('\n'));
        }
        if (clean.estimate().assumedClMax() || (flaps != null && flaps.estimate().assumedClMax())) {
            b.append("\n  NOTE: some sections give no cl-max; an assumed value was used (--assume-cl-max).\n");
        }
        if (flaps != null && flaps.estimate().defaultFlapIncrement()) {
            b.append("  NOTE: flapped stations use the handbook default plain-flap cl_max increment (no flap-cl-max table).\n");
        }
        if (condition.isEmpty()) {
            b.append("\n  No --weight given: no stall speeds; cl-max tables read at their lowest Reynolds number.\n");
        }
        b.append('\n').append(wrap(CAUTION)).append('\n');
        return b.toString();
    }

    /** The strip where stall starts (its right-hand one). */
    static StallEstimate.StripStall onsetStrip(StallEstimate e) {
        return e.strips().stream().filter(s -> Math.abs(s.y() - e.y()) < 1e-12).findFirst()
                .orElseThrow(() -> new IllegalStateException("the onset station is not a strip"));
    }

    private interface Cell {
        String of(Config c);
    }

    private static List<String> cells(String label, List<Config> configs, Cell cell) {
        List<String> row = new ArrayList<>();
        row.add(label);
        configs.forEach(c -> row.add(cell.of(c)));
        return row;
    }

    static String wrap(String text) {
        StringBuilder out = new StringBuilder("  ");
        int col = 2;
        for (String word : text.split(" ")) {
            if (col + word.length() > 100) {
                out.append("\n  ");
                col = 2;
            }
            out.append(word).append(' ');
            col += word.length() + 1;
        }
        return out.toString().replace(" \n", "\n").stripTrailing();
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
