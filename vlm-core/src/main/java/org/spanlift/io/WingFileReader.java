package org.spanlift.io;

import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.TextFile;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.DeflectionLimits;
import org.spanlift.geometry.Fuselage;
import org.spanlift.geometry.SurfaceRole;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.EllipticPlanform;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.lattice.Strip;
import org.spanlift.section.CamberLines;

/**
 * Reads a wing file ({@code .wing.yaml}) into a {@link Wing}, in two stages: the YAML tree with line marks
 * ({@link YamlParser}), then the model, checked field by field. Lengths are converted from the file's
 * {@code units} to metres, angles from degrees to radians. Every problem is an {@link InputException}
 * naming the file, line and field.
 */
public final class WingFileReader {

    /** Keys accepted at the top of a wing file (the schema sweeps check their paths against these sets). */
    public static final Set<String> TOP_KEYS = Set.of("name", "units", "reference", "surfaces", "sections",
            "structure", "fuselage", "thrust-line");
    /** Keys accepted under {@code reference}. */
    public static final Set<String> REFERENCE_KEYS = Set.of("area", "span", "chord", "moment-point");
    /** Keys accepted in each item of {@code surfaces}. */
    public static final Set<String> SURFACE_KEYS = Set.of("name", "mirror", "section", "stations", "trapezoid",
            "elliptic", "controls", "lattice", "fuselage-half-width", "role");
    /** Keys accepted in each item of a surface's {@code stations}. */
    public static final Set<String> STATION_KEYS = Set.of("y", "chord", "nose-x", "nose-z", "twist", "section");
    /** Keys accepted under a surface's {@code trapezoid}. */
    public static final Set<String> TRAPEZOID_KEYS = Set.of("span", "root-chord", "taper", "sweep", "dihedral",
            "washout", "root-twist", "root-nose");
    /** Keys accepted under a surface's {@code elliptic}. */
    public static final Set<String> ELLIPTIC_KEYS = Set.of("span", "root-chord", "dihedral", "washout",
            "root-twist", "root-nose");
    /** Keys accepted in each item of a surface's {@code controls}. */
    public static final Set<String> CONTROL_KEYS = Set.of("name", "kind", "from", "to", "chord-fraction",
            "deflection", "limits");
    /** Keys accepted under {@code fuselage}. */
    public static final Set<String> FUSELAGE_KEYS = Set.of("length", "width", "nose-x");
    /** Keys accepted under {@code thrust-line}. */
    public static final Set<String> THRUST_LINE_KEYS = Set.of("height");

    /** Largest control deflection or travel limit accepted, degrees either way. */
    public static final double MAX_DEFLECTION_DEG = 45;
    /** Keys accepted under a surface's {@code lattice}. */
    public static final Set<String> LATTICE_KEYS = Set.of("strips", "rows", "strip-spacing", "row-spacing");
    /** Keys accepted in each entry of {@code sections}. */
    public static final Set<String> SECTION_KEYS = SectionReader.KEYS;

    /** Largest lattice accepted: strips per surface. */
    public static final int MAX_STRIPS = 400;
    /** Largest lattice accepted: chordwise rows. */
    public static final int MAX_ROWS = 64;
    /** Largest lattice accepted: panels over the whole wing. */
    public static final int MAX_PANELS = 12_000;

    /**
     * Largest length accepted anywhere in a file, metres (10 km): far beyond any wing, small enough that
     * areas and integrals of the geometry stay finite.
     */
    public static final double MAX_LENGTH_M = 10_000;

    /**
     * Smallest length accepted where a length must be positive (a span, a chord, a reference length),
     * metres (1 mm): any smaller and the lattice's panels, or ratios such as the aspect ratio, stop being
     * numbers.
     */
    public static final double MIN_LENGTH_M = 0.001;

    /** Smallest reference area accepted, m^2 (1 mm by 1 mm). */
    public static final double MIN_AREA_M2 = MIN_LENGTH_M * MIN_LENGTH_M;
    /** Largest reference area accepted, m^2 (10 km by 10 km). */
    public static final double MAX_AREA_M2 = MAX_LENGTH_M * MAX_LENGTH_M;

    /** Name of the section a station gets when neither it nor its surface names one: a flat plate. */
    public static final String FLAT_SECTION = "flat";

    private WingFileReader() {
    }

    /** Reads and checks a wing file. */
    public static Wing read(Path path) {
        String file = path.toString();
        return parse(TextFile.read(path, "wing file"), file);
    }

    /** Reads a wing from YAML text; {@code file} names it in messages. */
    public static Wing parse(String text, String file) {
        return fromTree(YamlParser.parse(text, file), file);
    }

    /** The second stage: a wing from a YAML tree (perhaps changed by a sweep). */
    public static Wing fromTree(YamlValue tree, String file) {
        try {
            return build(tree, file);
        } catch (IllegalArgumentException e) {
            // A rule the model enforces that the checks above did not catch: still the file's fault.
            throw new InputException(file, 0, "", e.getMessage());
        }
    }

    private static Wing build(YamlValue tree, String file) {
        Field root = new Field(file, "", tree);
        root.mapping();
        root.allowOnly(TOP_KEYS);
        String name = root.optional("name").map(Field::text).orElse(String.valueOf(Path.of(file).getFileName()));
        LengthUnit unit = readUnit(root.required("units", "the length unit of the file: m, ft or in"));
        double k = unit.metres();

        Map<String, Section> sections = new LinkedHashMap<>();
        sections.put(FLAT_SECTION, Section.of(FLAT_SECTION, CamberLines.parse("flat")));
        root.optional("sections").ifPresent(s -> {
            List<Field> entries = s.entries();
            for (int i = 0; i < entries.size(); i++) {
                Field entry = entries.get(i);
                // The key itself, not the last part of the path: a section name may hold a dot.
                String sectionName = s.mapping().entries().get(i).key();
                if (sectionName.equals(FLAT_SECTION)) {
                    throw entry.error("the section name '" + FLAT_SECTION + "' is built in (a flat plate, the "
                            + "default of every surface); expected another name for this section");
                }
                sections.put(sectionName, SectionReader.read(entry, sectionName, Path.of(file)));
            }
        });

        Field surfacesField = root.required("surfaces", "a list of surfaces");
        List<Field> surfaceFields = surfacesField.items();
        if (surfaceFields.isEmpty()) {
            throw surfacesField.error("expected at least one surface");
        }
        List<Surface> surfaces = new ArrayList<>();
        Set<String> surfaceNames = new HashSet<>();
        Set<String> controlNames = new HashSet<>();
        Set<SurfaceRole> rolesTaken = new HashSet<>();
        int panels = 0;
        for (Field sf : surfaceFields) {
            Surface surface = readSurface(sf, k, sections, controlNames, surfaces.isEmpty(), rolesTaken);
            if (!surfaceNames.add(surface.name())) {
                throw sf.required("name", "a name").error("another surface has the name '" + Field.shown(surface.name())
                        + "'; expected a name no other surface has");
            }
            int own = (surface.mirrored() ? 2 : 1) * surface.lattice().strips() * surface.lattice().rows();
            panels += own;
            if (panels > MAX_PANELS) {
                Field at = sf.optional("lattice").orElse(sf);
                throw at.error("the lattice would have " + panels + " panels over the whole wing"
                        + (panels == own ? "" : " (" + own + " on this surface)") + "; expected at most "
                        + MAX_PANELS + ": lower strips or rows");
            }
            surfaces.add(surface);
        }
        root.optional("structure").ifPresent(st -> StructureReader.read(st, k, surfaces.get(0)));
        Reference defaults = Wing.defaultReference(surfaces.get(0));
        Reference reference = root.optional("reference").map(r -> readReference(r, k, defaults)).orElse(defaults);
        Optional<Fuselage> fuselage = root.optional("fuselage").map(fu -> readFuselage(fu, k));
        OptionalDouble thrustHeight = root.optional("thrust-line").map(t -> {
            t.allowOnly(THRUST_LINE_KEYS);
            Field h = t.required("height", "the height of the thrust line above the centre of gravity");
            return OptionalDouble.of(length(h, h.number(), k));
        }).orElse(OptionalDouble.empty());
        Wing wing = new Wing(name, unit, reference, surfaces, sections, fuselage, thrustHeight);
        checkFuselageSides(wing, surfaceFields, k);
        return wing;
    }

    /**
     * Refuses a fuselage half-width that leaves no strip of its surface outboard of the fuselage side: such a
     * surface would have no station that can stall. Strips are as the lattice places them.
     */
    private static void checkFuselageSides(Wing wing, List<Field> surfaceFields, double k) {
        Lattice lattice = null;
        for (int s = 0; s < wing.surfaces().size(); s++) {
            Surface surface = wing.surfaces().get(s);
            if (surface.fuselageHalfWidth() <= 0) {
                continue;
            }
            if (lattice == null) {
                lattice = LatticeBuilder.build(wing);
            }
            double outermost = 0;
            boolean outboard = false;
            for (Strip strip : lattice.strips()) {
                if (strip.surface() == s) {
                    outermost = Math.max(outermost, Math.abs(strip.y()));
                    outboard |= !surface.insideFuselage(strip.y());
                }
            }
            if (!outboard) {
                Field at = surfaceFields.get(s).required("fuselage-half-width", "");
                throw at.error("leaves no strip of the lattice outboard of the fuselage side (the outermost strip's "
                        + "centre is at y " + Field.brief(outermost / k) + "); expected a half-width below that, "
                        + "so that some of the span can stall, or more strips");
            }
        }
    }

    private static LengthUnit readUnit(Field f) {
        String t = f.choice(List.of("m", "ft", "in"));
        return LengthUnit.parse(t);
    }

    /** A length from the file: its number times the unit's metres, within {@link #MAX_LENGTH_M}. */
    private static double length(Field f, double value, double k) {
        double m = value * k;
        if (!(Math.abs(m) <= MAX_LENGTH_M)) {
            throw f.error("is " + Field.brief(value) + ", beyond any wing; expected a length within "
                    + Field.brief(MAX_LENGTH_M / k) + " " + unitName(k));
        }
        return m;
    }

    /**
     * A length that must be positive: from {@link #MIN_LENGTH_M} to {@link #MAX_LENGTH_M} once in metres.
     */
    private static double positiveLength(Field f, double k) {
        double value = f.positive();
        double m = length(f, value, k);
        if (!(m >= MIN_LENGTH_M)) {
            throw f.error("is " + Field.brief(value) + ", smaller than any part of a wing; expected a length of at "
                    + "least " + Field.brief(MIN_LENGTH_M / k) + " " + unitName(k) + " (1 mm)");
        }
        return m;
    }

    private static String unitName(double k) {
        for (LengthUnit u : LengthUnit.values()) {
            if (u.metres() == k) {
                return u.symbol();
            }
        }
        return "m";
    }

    private static String name(Field f, String what) {
        String name = f.text().trim();
        if (name.isEmpty() || name.contains("=") || name.contains(",")) {
            throw f.error("'" + Field.shown(f.text()) + "' cannot name " + what
                    + "; expected a name that is not blank and "
                    + "holds neither '=' nor ','");
        }
        return name;
    }

    private static Reference readReference(Field f, double k, Reference defaults) {
        f.allowOnly(REFERENCE_KEYS);
        double area = f.optional("area").map(a -> {
            double v = a.positive();
            double m2 = v * k * k;
            if (!(m2 >= MIN_AREA_M2 && m2 <= MAX_AREA_M2)) {
                throw a.error("is " + Field.brief(v) + " " + unitName(k) + "^2; expected an area from "
                        + Field.brief(MIN_AREA_M2 / (k * k)) + " to " + Field.brief(MAX_AREA_M2 / (k * k)) + " "
                        + unitName(k) + "^2 (1 mm by 1 mm to 10 km by 10 km)");
            }
            return m2;
        }).orElse(defaults.area());
        double span = f.optional("span").map(a -> positiveLength(a, k)).orElse(defaults.span());
        double chord = f.optional("chord").map(a -> positiveLength(a, k)).orElse(defaults.chord());
        Vec3 point = f.optional("moment-point").map(p -> {
            double[] v = p.numbers(3);
            return new Vec3(length(p, v[0], k), length(p, v[1], k), length(p, v[2], k));
        }).orElse(defaults.momentPoint());
        return new Reference(area, span, chord, point);
    }

    private static Fuselage readFuselage(Field f, double k) {
        f.allowOnly(FUSELAGE_KEYS);
        double length = positiveLength(f.required("length", "the fuselage's length"), k);
        double width = positiveLength(f.required("width", "the fuselage's greatest width"), k);
        Field nose = f.required("nose-x", "the x of the fuselage's nose");
        return new Fuselage(length, width, length(nose, nose.number(), k));
    }

    private static SurfaceRole readRole(Field f, boolean first) {
        SurfaceRole role = switch (f.choice(List.of("wing", "tail", "canard"))) {
            case "wing" -> SurfaceRole.WING;
            case "tail" -> SurfaceRole.TAIL;
            default -> SurfaceRole.CANARD;
        };
        if (first != (role == SurfaceRole.WING)) {
            throw f.error(first ? "the first surface is the wing; expected role wing here, or put the wing first"
                    : "only the first surface is the wing; expected tail or canard, or no role");
        }
        return role;
    }

    private static Surface readSurface(Field f, double k, Map<String, Section> sections, Set<String> controlNames,
            boolean first, Set<SurfaceRole> rolesTaken) {
        f.allowOnly(SURFACE_KEYS);
        String name = name(f.required("name", "a name for the surface"), "a surface");
        SurfaceRole role = f.optional("role").map(r -> {
            SurfaceRole read = readRole(r, first);
            if (!rolesTaken.add(read)) {
                throw r.error("another surface is already the " + read.word() + "; expected one " + read.word()
                        + " at most");
            }
            return read;
        }).orElse(first ? SurfaceRole.WING : SurfaceRole.OTHER);
        boolean mirrored = f.optional("mirror").map(Field::bool).orElse(true);
        Optional<Field> sectionField = f.optional("section");
        String surfaceSection = sectionField.map(s -> sectionName(s, sections)).orElse(FLAT_SECTION);

        List<YamlValue.Entry> shapes = f.mapping().entries().stream()
                .filter(e -> List.of("stations", "trapezoid", "elliptic").contains(e.key())).toList();
        if (shapes.isEmpty()) {
            throw f.error("missing the planform; expected one of the keys stations, trapezoid or elliptic");
        }
        if (shapes.size() > 1) {
            YamlValue.Entry second = shapes.get(1);
            throw new InputException(f.file(), second.keyLine(), f.path() + "." + second.key(), "the surface "
                    + "already has '" + shapes.get(0).key() + "' (line " + shapes.get(0).keyLine()
                    + "); expected only one of stations, trapezoid or elliptic");
        }
        String shape = shapes.get(0).key();
        Field shapeField = f.required(shape, shape.equals("stations") ? "a list of stations from root to tip"
                : "a mapping of the " + shape + "'s dimensions");
        Planform planform = switch (shape) {
            case "stations" -> readStations(shapeField, k, mirrored, surfaceSection, sections);
            case "trapezoid" -> readTrapezoid(shapeField, k, mirrored, surfaceSection);
            default -> readElliptic(shapeField, k, mirrored, surfaceSection);
        };

        List<ControlSurface> controls = new ArrayList<>();
        List<Field> controlFields = f.optional("controls").map(c -> {
            if (c.items().isEmpty()) {
                throw c.error("an empty list; expected at least one control {name, kind, from, to, chord-fraction}, "
                        + "or leave controls out");
            }
            return c.items();
        }).orElse(List.of());
        for (Field cf : controlFields) {
            ControlSurface c = readControl(cf, k, mirrored, planform, controls, role);
            if (!controlNames.add(c.name())) {
                throw cf.required("name", "a name for the control").error("another control has the name '"
                        + Field.shown(c.name()) + "'; expected a name no other control in the file has");
            }
            controls.add(c);
        }
        LatticeSpec lattice = f.optional("lattice").map(l -> readLattice(l, controls.isEmpty()))
                .orElse(LatticeSpec.DEFAULT);
        int cuts = countInteriorCuts(planform, controls, lattice);
        if (cuts > lattice.strips() - 1) {
            Field at = f.optional("lattice").map(l -> l.optional("strips").orElse(l)).orElse(f);
            throw at.error(lattice.strips() + " strips cannot place a strip edge on each of the surface's " + cuts
                    + " control ends and stations; expected at least " + (cuts + 1) + " strips");
        }
        double fuselage = f.optional("fuselage-half-width").map(w -> fuselageHalfWidth(w, k, mirrored, planform))
                .orElse(0.0);
        return new Surface(name, mirrored, planform, controls, lattice, fuselage, role);
    }

    private static double fuselageHalfWidth(Field f, double k, boolean mirrored, Planform planform) {
        if (!mirrored) {
            throw f.error("a fuselage half-width applies to a mirrored surface only; expected mirror: true");
        }
        double w = f.number();
        if (!(w >= 0)) {
            throw f.error("must not be negative, got " + f.text());
        }
        double metres = length(f, w, k);
        if (!(metres < planform.yEnd())) {
            throw f.error("must be less than the semi-span (" + Field.format(planform.yEnd() / k) + "), got "
                    + f.text());
        }
        return metres;
    }

    private static int countInteriorCuts(Planform p, List<ControlSurface> controls, LatticeSpec spec) {
        Set<Long> cuts = new HashSet<>();
        double tol = 1e-9 * (p.yEnd() - p.yStart());
        List<Double> ys = new ArrayList<>();
        for (ControlSurface c : controls) {
            ys.add(c.from());
            ys.add(c.to());
        }
        if (p.stationYs().size() - 1 <= spec.strips() / 2) {
            ys.addAll(p.stationYs());
        }
        for (double y : ys) {
            if (y > p.yStart() + tol && y < p.yEnd() - tol) {
                cuts.add(Math.round(y / tol));
            }
        }
        return cuts.size();
    }

    private static String sectionName(Field f, Map<String, Section> sections) {
        String name = f.text();
        if (!sections.containsKey(name)) {
            List<String> known = sections.keySet().stream().filter(s -> !s.equals(FLAT_SECTION)).toList();
            throw f.error("unknown section '" + Field.shown(name) + "'; expected " + (known.isEmpty()
                    ? "flat, or a section defined under 'sections' (the file defines none)"
                    : "flat or one of the file's sections: " + String.join(", ", known)));
        }
        return name;
    }

    private static Planform readStations(Field f, double k, boolean mirrored, String surfaceSection,
            Map<String, Section> sections) {
        List<Field> items = f.items();
        if (items.size() < 2) {
            throw f.error("expected at least two stations (root and tip), got " + items.size());
        }
        List<Station> stations = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Field s = items.get(i);
            s.allowOnly(STATION_KEYS);
            Field yField = s.required("y", "the station's spanwise position");
            double y = length(yField, yField.number(), k);
            if (mirrored && i == 0 && y < 0) {
                throw yField.error("the root is at " + Field.format(y / k) + ", but a mirrored surface is "
                        + "described on its right half; expected a root y of 0 or more");
            }
            if (i > 0 && !(y > stations.get(i - 1).y())) {
                throw yField.error("is " + Field.format(y / k) + ", after a station at "
                        + Field.format(stations.get(i - 1).y() / k) + "; expected stations in increasing y from root "
                        + "to tip");
            }
            Field chordField = s.required("chord", "the local chord");
            double chord = length(chordField, chordField.number(), k);
            boolean tip = i == items.size() - 1;
            if (tip ? chord < 0 : !(chord > 0)) {
                throw chordField.error(tip ? "must not be negative, got " + Field.format(chord / k)
                        + "; expected a tip chord of 0 or more"
                        : "must be positive, got " + Field.format(chord / k) + "; expected a chord above 0 (only "
                        + "the tip station may have zero chord)");
            }
            if (chord > 0 && chord < MIN_LENGTH_M) {
                throw chordField.error("is " + Field.brief(chordField.number()) + ", smaller than any part of a wing; "
                        + "expected a chord of at least " + Field.brief(MIN_LENGTH_M / k) + " " + unitName(k)
                        + " (1 mm)" + (tip ? ", or 0 for a pointed tip" : ""));
            }
            double noseX = s.optional("nose-x").map(n -> length(n, n.number(), k)).orElse(0.0);
            double noseZ = s.optional("nose-z").map(n -> length(n, n.number(), k)).orElse(0.0);
            double twist = Math.toRadians(s.optional("twist").map(t -> t.inRange(-45, 45)).orElse(0.0));
            String section = s.optional("section").map(x -> sectionName(x, sections)).orElse(surfaceSection);
            stations.add(new Station(y, chord, noseX, noseZ, twist, section));
        }
        return new StationPlanform(stations);
    }

    private static Planform readTrapezoid(Field f, double k, boolean mirrored, String section) {
        f.allowOnly(TRAPEZOID_KEYS);
        requireMirrored(f, mirrored);
        double span = positiveLength(f.required("span", "the tip-to-tip span"), k);
        double rootChord = positiveLength(f.required("root-chord", "the root chord"), k);
        double taper = f.optional("taper").map(t -> t.inRange(0, 10)).orElse(1.0);
        double sweep = Math.toRadians(f.optional("sweep").map(t -> t.inRange(-60, 60)).orElse(0.0));
        double dihedral = Math.toRadians(f.optional("dihedral").map(t -> t.inRange(-30, 30)).orElse(0.0));
        double washout = Math.toRadians(f.optional("washout").map(t -> t.inRange(-20, 20)).orElse(0.0));
        double rootTwist = Math.toRadians(f.optional("root-twist").map(t -> t.inRange(-45, 45)).orElse(0.0));
        double[] nose = rootNose(f, k);
        return new Trapezoid(span, rootChord, taper, sweep, dihedral, rootTwist, washout, section, nose[0], nose[1])
                .planform();
    }

    private static Planform readElliptic(Field f, double k, boolean mirrored, String section) {
        f.allowOnly(ELLIPTIC_KEYS);
        requireMirrored(f, mirrored);
        double semi = positiveLength(f.required("span", "the tip-to-tip span"), k) / 2;
        double rootChord = positiveLength(f.required("root-chord", "the root chord"), k);
        double dihedral = Math.toRadians(f.optional("dihedral").map(t -> t.inRange(-30, 30)).orElse(0.0));
        double washout = Math.toRadians(f.optional("washout").map(t -> t.inRange(-20, 20)).orElse(0.0));
        double rootTwist = Math.toRadians(f.optional("root-twist").map(t -> t.inRange(-45, 45)).orElse(0.0));
        double[] nose = rootNose(f, k);
        return new EllipticPlanform(semi, rootChord, nose[0], nose[1], dihedral, rootTwist, washout, section);
    }

    /** The root leading edge [x, z] in metres; the origin when not given. */
    private static double[] rootNose(Field f, double k) {
        return f.optional("root-nose").map(n -> {
            double[] v = n.numbers(2);
            return new double[] {length(n, v[0], k), length(n, v[1], k)};
        }).orElse(new double[2]);
    }

    private static void requireMirrored(Field f, boolean mirrored) {
        if (!mirrored) {
            throw f.error("describes a mirrored surface (right half from y = 0) but the surface has mirror: false; "
                    + "expected mirror: true, or stations for an unmirrored surface");
        }
    }

    private static ControlSurface readControl(Field f, double k, boolean mirrored, Planform planform,
            List<ControlSurface> earlier, SurfaceRole role) {
        f.allowOnly(CONTROL_KEYS);
        String name = name(f.required("name", "a name for the control"), "a control");
        Field kindField = f.required("kind", "flap, aileron or elevator");
        ControlKind kind = switch (kindField.choice(List.of("flap", "aileron", "elevator"))) {
            case "flap" -> ControlKind.FLAP;
            case "aileron" -> ControlKind.AILERON;
            default -> ControlKind.ELEVATOR;
        };
        if (kind == ControlKind.ELEVATOR && !role.pitchControlling()) {
            throw kindField.error("an elevator belongs on the tail or the canard; expected role: tail or role: canard "
                    + "on this surface, or another kind");
        }
        if (kind == ControlKind.AILERON && !mirrored) {
            throw kindField.error("an aileron deflects antisymmetrically and needs a mirrored surface; "
                    + "expected kind flap here, or mirror: true on the surface");
        }
        Field fromField = f.required("from", "the y of the control's inner end");
        Field toField = f.required("to", "the y of the control's outer end");
        double from = length(fromField, fromField.number(), k);
        double to = length(toField, toField.number(), k);
        double tol = 1e-9 * (planform.yEnd() - planform.yStart());
        String span = "expected a y from " + Field.format(planform.yStart() / k) + " to "
                + Field.format(planform.yEnd() / k) + " (the surface's " + (mirrored ? "right half" : "span") + ")";
        if (from < planform.yStart() - tol || from > planform.yEnd() + tol) {
            throw fromField.error(Field.format(from / k) + " lies outside the surface; " + span);
        }
        if (to < planform.yStart() - tol || to > planform.yEnd() + tol) {
            throw toField.error(Field.format(to / k) + " lies outside the surface; " + span);
        }
        if (!(to > from)) {
            throw toField.error("is " + Field.format(to / k) + ", not beyond 'from' (" + Field.format(from / k)
                    + "); expected the outer end, greater than 'from'");
        }
        for (ControlSurface c : earlier) {
            if (from < c.to() - tol && to > c.from() + tol) {
                throw fromField.error("the span from " + Field.format(from / k) + " to " + Field.format(to / k)
                        + " overlaps control '" + Field.shown(c.name()) + "' (y from " + Field.format(c.from() / k)
                        + " to "
                        + Field.format(c.to() / k) + "); expected controls that do not overlap");
            }
        }
        Field cfField = f.required("chord-fraction", "the control's chord over the local chord, between 0 and 1");
        double cf = cfField.number();
        if (!(cf > 0 && cf < 1)) {
            throw cfField.error("is " + Field.format(cf) + "; expected a fraction of the local chord between 0 and 1, "
                    + "both excluded");
        }
        double deflection = Math.toRadians(f.optional("deflection")
                .map(d -> d.inRange(-MAX_DEFLECTION_DEG, MAX_DEFLECTION_DEG)).orElse(0.0));
        Optional<DeflectionLimits> limits = f.optional("limits").map(l -> {
            double[] v = l.numbers(2);
            for (double d : v) {
                if (!(Math.abs(d) <= MAX_DEFLECTION_DEG)) {
                    throw l.error("holds " + Field.brief(d) + "; expected [least, greatest] in degrees (trailing edge "
                            + "down positive), each within " + Field.brief(MAX_DEFLECTION_DEG));
                }
            }
            if (!(v[0] < v[1])) {
                throw l.error("is [" + Field.brief(v[0]) + ", " + Field.brief(v[1])
                        + "]; expected [least, greatest] in "
                        + "degrees, the least first");
            }
            double lo = Math.toRadians(v[0]);
            double hi = Math.toRadians(v[1]);
            if (deflection < lo || deflection > hi) {
                throw l.error("do not hold the control's deflection of " + Field.brief(Math.toDegrees(deflection))
                        + " degrees; expected limits around it");
            }
            return new DeflectionLimits(lo, hi);
        });
        return new ControlSurface(name, kind, from, to, cf, deflection, limits);
    }

    private static LatticeSpec readLattice(Field f, boolean noControls) {
        f.allowOnly(LATTICE_KEYS);
        LatticeSpec d = LatticeSpec.DEFAULT;
        int strips = f.optional("strips").map(s -> s.integer(1, MAX_STRIPS)).orElse(d.strips());
        int rows = f.optional("rows").map(r -> {
            int n = r.integer(1, MAX_ROWS);
            if (n < 2 && !noControls) {
                throw r.error("is 1, but the surface has controls; expected at least 2 rows, so that a row edge "
                        + "can lie on the hinge line");
            }
            return n;
        }).orElse(d.rows());
        Spacing ss = f.optional("strip-spacing").map(WingFileReader::spacing).orElse(d.stripSpacing());
        Spacing rs = f.optional("row-spacing").map(WingFileReader::spacing).orElse(d.rowSpacing());
        return new LatticeSpec(strips, rows, ss, rs);
    }

    private static Spacing spacing(Field f) {
        return f.choice(List.of("uniform", "cosine")).equals("uniform") ? Spacing.UNIFORM : Spacing.COSINE;
    }
}
