package org.spanlift.io;

import org.spanlift.loads.Envelope;
import org.spanlift.structure.EnvelopeSpec;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

import org.spanlift.input.Field;
import org.spanlift.input.TextFile;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/**
 * Reads an envelope file ({@code .envelope.yaml}): the limit load factors, design speeds (equivalent
 * airspeeds) and derived gust velocities from which {@link Envelope} builds the corner-point load cases.
 *
 * <pre>
 * weight: 1100kg                 # or a list: [1100kg, 800kg]
 * altitude: 0ft                  # pressure altitude for the gust mass ratio (default 0)
 * load-factors: {positive: 3.8, negative: -1.52, negative-at-vd: 0}
 * speeds: {va: 105kt, vc: 125kt, vd: 175kt}      # vb optional, with a gust at vb
 * gusts: {vc: 50ft/s, vd: 25ft/s}
 * lift-slope: 5.1                # optional, per radian; default the wing's own
 * cl-min: -0.8                   # optional: adds the negative-stall corner
 * </pre>
 */
public final class EnvelopeReader {

    /** Keys accepted at the top of an envelope file. */
    public static final Set<String> TOP_KEYS = Set.of("weight", "altitude", "load-factors", "speeds", "gusts",
            "lift-slope", "cl-min");
    /** Keys accepted under {@code load-factors}. */
    public static final Set<String> FACTOR_KEYS = Set.of("positive", "negative", "negative-at-vd");
    /** Keys accepted under {@code speeds}. */
    public static final Set<String> SPEED_KEYS = Set.of("va", "vb", "vc", "vd");
    /** Keys accepted under {@code gusts}. */
    public static final Set<String> GUST_KEYS = Set.of("vb", "vc", "vd");

    private EnvelopeReader() {
    }

    /** Reads and checks an envelope file. */
    public static EnvelopeSpec read(Path path) {
        String file = path.toString();
        return parse(TextFile.read(path, "envelope file"), file);
    }

    /** Parses and checks an envelope file's text; {@code file} names it in messages. */
    public static EnvelopeSpec parse(String text, String file) {
        YamlValue tree = YamlParser.parse(text, file,
                "an envelope description (weight, load-factors, speeds and gusts)");
        Field root = new Field(file, "", tree);
        root.mapping();
        root.allowOnly(TOP_KEYS);
        Field wf = root.required("weight", "the aircraft weight with a unit (such as 1100kg), or a list of weights");
        List<Double> weights = new ArrayList<>();
        if (wf.value() instanceof YamlValue.Sequence) {
            List<Field> items = wf.items();
            if (items.isEmpty() || items.size() > 20) {
                throw wf.error("expected from 1 to 20 weights, got " + items.size());
            }
            items.forEach(i -> weights.add(i.weight()));
        } else {
            weights.add(wf.weight());
        }
        double h = root.optional("altitude").map(CasesReader::altitude).orElse(0.0);

        Field lf = root.required("load-factors", "{positive, negative, negative-at-vd}");
        lf.allowOnly(FACTOR_KEYS);
        double n1 = lf.required("positive", "the positive limit manoeuvring load factor")
                .inRange(1, CasesReader.MAX_LOAD_FACTOR);
        Field n2f = lf.required("negative", "the negative limit manoeuvring load factor (below 0)");
        double n2 = n2f.inRange(-CasesReader.MAX_LOAD_FACTOR, 0);
        if (!(n2 < 0)) {
            throw n2f.error("must be below 0, got " + Field.format(n2));
        }
        double nd = lf.optional("negative-at-vd").map(f -> {
            double v = f.inRange(n2, 0);
            return v;
        }).orElse(0.0);

        Field sf = root.required("speeds", "the design speeds {va, vc, vd} (equivalent airspeeds; vb optional)");
        sf.allowOnly(SPEED_KEYS);
        double va = Quantities.speed(sf.required("va", "the design manoeuvring speed"));
        Field vcf = sf.required("vc", "the design cruising speed");
        double vc = Quantities.speed(vcf);
        Field vdf = sf.required("vd", "the design dive speed");
        double vd = Quantities.speed(vdf);
        if (!(va <= vc)) {
            throw vcf.error("VC must not be below VA");
        }
        if (!(vd > vc)) {
            throw vdf.error("VD must be above VC");
        }
        OptionalDouble vb = sf.optional("vb").map(f -> OptionalDouble.of(Quantities.speed(f)))
                .orElse(OptionalDouble.empty());

        Field gf = root.required("gusts", "the derived gust velocities {vc, vd} (vb with a vb speed)");
        gf.allowOnly(GUST_KEYS);
        double uc = Quantities.speed(gf.required("vc", "the derived gust velocity at VC, such as 50ft/s"));
        double ud = Quantities.speed(gf.required("vd", "the derived gust velocity at VD, such as 25ft/s"));
        OptionalDouble ub = OptionalDouble.empty();
        if (vb.isPresent() != gf.has("vb")) {
            throw (vb.isPresent() ? gf : sf).error("a gust at VB needs both speeds.vb and gusts.vb");
        }
        if (vb.isPresent()) {
            ub = OptionalDouble.of(Quantities.speed(gf.required("vb", "")));
        }
        OptionalDouble slope = root.optional("lift-slope")
                .map(f -> OptionalDouble.of(f.inRange(0.5, 2 * Math.PI + 1e-9)))
                .orElse(OptionalDouble.empty());
        OptionalDouble clMin = root.optional("cl-min").map(f -> {
            double c = f.inRange(-3, 0);
            if (!(c < 0)) {
                throw f.error("must be below 0, got " + Field.format(c));
            }
            return OptionalDouble.of(c);
        }).orElse(OptionalDouble.empty());
        return new EnvelopeSpec(weights, h, n1, n2, nd, va, vb, vc, vd, ub, uc, ud, slope, clMin);
    }
}
