package org.spanlift.vocabulary;

import static org.spanlift.vocabulary.ResultUnit.COUNT;
import static org.spanlift.vocabulary.ResultUnit.DEGREE;
import static org.spanlift.vocabulary.ResultUnit.FLAG;
import static org.spanlift.vocabulary.ResultUnit.METRE;
import static org.spanlift.vocabulary.ResultUnit.METRE_PER_SECOND;
import static org.spanlift.vocabulary.ResultUnit.NEWTON;
import static org.spanlift.vocabulary.ResultUnit.NEWTON_METRE;
import static org.spanlift.vocabulary.ResultUnit.NONE;
import static org.spanlift.vocabulary.ResultUnit.PASCAL;
import static org.spanlift.vocabulary.ResultUnit.PER_DEGREE;
import static org.spanlift.vocabulary.ResultUnit.PER_RADIAN;
import static org.spanlift.vocabulary.ResultUnit.SQUARE_METRE;
import static org.spanlift.vocabulary.ResultUnit.TEXT;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;

import org.spanlift.balance.Balance;
import org.spanlift.balance.BalanceStudy;
import org.spanlift.flight.FlightPoint;
import org.spanlift.lattice.Lattice;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StallStudy;
import org.spanlift.washout.WashoutDesign;

/**
 * Every scalar result a user can ask for, declared once: key, SI unit, table label, description and how it
 * is obtained. The JSON, CSV and table writers, the sweep's columns, {@code compare} and {@code report} all
 * take their keys from here. Lengths in metres, angles in degrees (the key says so), speeds in m/s.
 *
 * <p>The results come in groups by their source:
 * <ul>
 * <li>{@link #WING}: the wing at its deflections (reference values, lattice, lift curve);</li>
 * <li>{@link #POINT}: one flight point, named in a sweep with {@code @CL=} or {@code @alpha=}
 * ({@code e@CL=0.5});</li>
 * <li>{@link #SURFACE}: one surface's share of a flight point (where the wing file has several surfaces);</li>
 * <li>{@link #ONSET}: a stall onset, under {@link #CLEAN} ({@code stall.eta}) or {@link #FLAPS}
 * ({@code stall_flaps.CL});</li>
 * <li>{@link #MAX_LIFT}: a maximum lift from the section lift curves, under {@link #MAX_CLEAN}
 * ({@code max_lift.CL}) or {@link #MAX_FLAPS};</li>
 * <li>{@link #STUDY}: the clean-and-flapped stall study (flap increment, stall speeds);</li>
 * <li>{@link #WASHOUT}: the answer of a washout search ({@code washout.least_deg});</li>
 * <li>{@link #TRIM}: one trimmed point of level flight (the rows of {@code balance}'s trim table);</li>
 * <li>{@link #BALANCE}: the configuration in balance at one centre of gravity, under {@link #BALANCE_PREFIX} in a
 * sweep ({@code balance.static_margin});</li>
 * <li>{@link #LOADS}: one load case's root loads, under {@link #LOAD_CASE} in {@code compare};</li>
 * <li>{@link #CONTROL}: a control's geometry, under {@code controls.NAME.}.</li>
 * </ul>
 *
 * <p>Adding a result is one declaration in its group, plus its test.
 */
public final class Vocabulary {

    /** The prefix of the clean configuration's onset keys. */
    public static final String CLEAN = "stall.";
    /** The prefix of the flapped configuration's onset keys. */
    public static final String FLAPS = "stall_flaps.";
    /** The prefix of the clean configuration's maximum-lift keys. */
    public static final String MAX_CLEAN = "max_lift.";
    /** The prefix of the flapped configuration's maximum-lift keys. */
    public static final String MAX_FLAPS = "max_lift_flaps.";
    /** The prefix of the load keys where several groups share one flat row (compare). */
    public static final String LOAD_CASE = "loads.";
    /** The prefix of the balance keys in a sweep. */
    public static final String BALANCE_PREFIX = "balance.";
    /** The prefix of a control's keys, followed by its name and a dot. */
    public static final String CONTROLS = "controls.";

    private static final Set<Need> CL_MAX = Set.of(Need.CL_MAX);
    private static final Set<Need> POLARS = Set.of(Need.POLARS);

    /** The wing at its deflections. */
    public static final List<ResultKey<WingResult>> WING = List.of(
            key("reference.area", SQUARE_METRE, "reference area", "reference area, both halves", 3,
                    w -> w.analysis().wing().reference().area()),
            key("reference.span", METRE, "reference span", "reference span, tip to tip", 3,
                    w -> w.analysis().wing().reference().span()),
            key("reference.chord", METRE, "reference chord", "reference chord of the pitching moment", 3,
                    w -> w.analysis().wing().reference().chord()),
            key("reference.aspect_ratio", NONE, "aspect ratio", "span squared over reference area", 3,
                    w -> w.analysis().wing().reference().aspectRatio()),
            key("mean_aerodynamic_chord", METRE, "mean aerodynamic chord",
                    "mean aerodynamic chord of the first surface", 3,
                    w -> w.analysis().wing().main().meanAerodynamicChord()),
            key("lattice.panels", COUNT, "panels", "panels of the whole lattice, both halves", 0,
                    w -> w.analysis().lattice().panelCount()),
            key("lattice.strips", COUNT, "strips", "strips of the whole lattice, both halves", 0,
                    w -> w.analysis().lattice().strips().size()),
            key("lattice.unknowns", COUNT, "unknowns", "size of each influence system solved", 0,
                    w -> unknowns(w.analysis().lattice())),
            key("lift_slope_per_rad", PER_RADIAN, "lift slope", "dCL/dalpha at zero lift, per radian", 4,
                    w -> w.curve().slope()),
            key("lift_slope_per_deg", PER_DEGREE, "lift slope", "dCL/dalpha at zero lift, per degree", 5,
                    w -> w.curve().slope() * Math.PI / 180),
            key("zero_lift_angle_deg", DEGREE, "zero-lift angle", "angle of attack of zero wing lift", 3,
                    w -> Math.toDegrees(w.curve().zeroLiftAngle())));

    /** One flight point. */
    public static final List<ResultKey<FlightPoint>> POINT = List.of(
            key("alpha_deg", DEGREE, "alpha", "angle of attack", 2, p -> Math.toDegrees(p.alpha())),
            key("CL", NONE, "CL", "lift coefficient of the whole configuration", 4, p -> p.coefficients().lift()),
            key("CDi", NONE, "CDi", "induced drag coefficient (Trefftz plane)", 5,
                    p -> p.coefficients().inducedDrag()),
            key("e", NONE, "e", "span efficiency CL^2/(pi A CDi); absent where |CL| < 0.05", 4,
                    p -> boxed(p.coefficients().spanEfficiency())),
            key("Cm", NONE, "Cm", "pitching moment coefficient about the moment point, positive nose-up", 4,
                    p -> p.coefficients().pitchingMoment()),
            key("C_roll", NONE, "C_roll", "rolling moment coefficient on q S b, positive right wing down", 5,
                    p -> p.coefficients().rollingMoment()),
            key("CDp", NONE, "CDp", "profile drag coefficient (strip integration of the section polars)", 5,
                    POLARS, p -> boxed(p.profileDrag())),
            key("CD", NONE, "CD", "drag coefficient, CDi + CDp", 5, POLARS, p -> boxed(p.drag())),
            key("L_D", NONE, "L/D", "lift over drag, CL / CD", 1, POLARS, p -> boxed(p.liftToDrag())));

    /** A stall onset (critical-section method, linear theory). */
    public static final List<ResultKey<StallEstimate>> ONSET = List.of(
            key("CL", NONE, "wing CL at onset", "CL at stall onset: the wing's; where the wing file has other "
                    + "surfaces, the configuration's (wing and other surfaces, untrimmed, at the deflections given), "
                    + "on which the stall speeds rest", 3, CL_MAX, StallEstimate::lift),
            key("wing_CL", NONE, "wing's own CL at onset", "the wing's own CL at stall onset (its lift on the "
                    + "reference area, the other surfaces' left out); written where the wing file has other surfaces",
                    3, Set.of(Need.CL_MAX, Need.SURFACES), StallEstimate::wingLift),
            key("alpha_deg", DEGREE, "alpha at onset", "angle of attack at stall onset", 2, CL_MAX,
                    e -> Math.toDegrees(e.alpha())),
            key("y", METRE, "onset station y", "spanwise station where stall starts", 3, CL_MAX, StallEstimate::y),
            key("eta", NONE, "onset station eta", "that station over the semi-span", 3, CL_MAX,
                    StallEstimate::eta),
            key("section", TEXT, "section there", "the section nearest to the onset station", 0, CL_MAX,
                    StallEstimate::section),
            key("section_alpha_deg", DEGREE, "  its angle of attack",
                    "the onset section's effective angle of attack", 2, CL_MAX,
                    e -> Math.toDegrees(e.onsetStrip().sectionAngle())),
            key("aileron_margin.dcl", NONE, "aileron margin dcl",
                    "least cl_max - cl over the aileron span at onset", 3, CL_MAX,
                    e -> e.aileronMargin().map(m -> (Object) m.dcl()).orElse(null)),
            key("aileron_margin.y", METRE, "  at y", "where that least aileron margin is", 3, CL_MAX,
                    e -> e.aileronMargin().map(m -> (Object) Math.abs(m.y())).orElse(null)),
            key("half_span_CL", NONE, "CL with half span at cl_max",
                    "CL (as the onset's CL) at which half the wing's span has reached cl_max (linear theory)", 3,
                    CL_MAX,
                    e -> boxed(e.halfSpanLift())),
            key("assumed_cl_max", FLAG, "cl_max assumed", "true when some section's cl_max was assumed", 0,
                    CL_MAX, StallEstimate::assumedClMax),
            key("pointed_tip_from", METRE, "onset leaves out strips from |y|",
                    "where the strips left out of the onset begin: a chord under 5% of the mean aerodynamic chord, "
                            + "toward a tip ending in a point", 3, CL_MAX, e -> boxed(e.pointedTipFrom())),
            key("default_flap_increment", FLAG, "default flap increment",
                    "true when a flapped strip used the handbook default cl_max increment", 0, CL_MAX,
                    StallEstimate::defaultFlapIncrement),
            key("beside_control_end.control", TEXT, "onset beside the end of",
                    "the deflected control whose end the onset strip touches (lattice-sensitive onset)", 0,
                    CL_MAX, e -> e.besideControlEnd().map(c -> (Object) c.control()).orElse(null)),
            key("beside_control_end.y", METRE, "  that end at y", "the y of that control end", 3, CL_MAX,
                    e -> e.besideControlEnd().map(c -> (Object) c.y()).orElse(null)),
            key("beside_control_end.first_on_control.CL", NONE, "  first on the control at CL",
                    "the CL (as the onset's CL) at which a strip on that control itself first reaches cl_max", 3,
                    CL_MAX,
                    e -> e.besideControlEnd().flatMap(StallEstimate.ControlEnd::firstOnControl)
                            .map(f -> (Object) f.lift()).orElse(null)),
            key("beside_control_end.first_on_control.y", METRE, "  at y", "that strip's y", 3, CL_MAX,
                    e -> e.besideControlEnd().flatMap(StallEstimate.ControlEnd::firstOnControl)
                            .map(f -> (Object) Math.abs(f.y())).orElse(null)));

    /** One surface's share of a flight point, on the wing's reference area, span and chord. */
    public static final List<ResultKey<SurfaceResult>> SURFACE = List.of(
            key("name", TEXT, "surface", "the surface's name in the wing file", 0, s -> s.name()),
            key("role", TEXT, "role", "what the surface does: wing, tail, canard or other", 0,
                    s -> s.role().word()),
            key("CL", NONE, "CL", "the surface's lift coefficient on the reference area", 4,
                    s -> s.coefficients().lift()),
            key("CDi", NONE, "CDi", "the surface's induced drag coefficient on the reference area (Trefftz plane: "
                    + "its circulation in the downwash of every surface's wake)", 5,
                    s -> s.coefficients().inducedDrag()),
            key("Cm", NONE, "Cm", "the surface's pitching moment coefficient about the moment point, on the "
                    + "reference area and chord, positive nose-up", 4, s -> s.coefficients().pitchingMoment()));

    /** A maximum lift from the section lift curves (the lattice coupled with them, traced through the stall). */
    public static final List<ResultKey<MaximumLift>> MAX_LIFT = List.of(
            key("CL", NONE, "maximum CL", "the highest CL of the coupled lift curve: the wing's; where the wing file "
                    + "has other surfaces, the configuration's (untrimmed, at the deflections given)", 3, CL_MAX,
                    MaximumLift::lift),
            key("alpha_deg", DEGREE, "alpha at maximum CL", "its angle of attack", 2, CL_MAX,
                    m -> Math.toDegrees(m.alpha())),
            key("configuration_CL", NONE, "  configuration CL there", "the whole configuration's CL at the wing's "
                    + "maximum (every surface, untrimmed): what its stall speed rests on", 3,
                    Set.of(Need.CL_MAX, Need.SURFACES), MaximumLift::configurationLift),
            key("rounds_over", FLAG, "lift rounds over at the maximum",
                    "true when the lift rounds over at the maximum (a gentle stall); false when the maximum lies at "
                            + "a fold, where a station stalls abruptly and the lift breaks off, or where the traced "
                            + "curve ended (trace_end)", 0, CL_MAX, MaximumLift::peak),
            key("trace_end", TEXT, "traced curve ended",
                    "why the traced lift curve ended: past-maximum, curve-ends (a tabulated section curve ended), "
                            + "deep-stall (a station 10 degrees past its peak), range, stalled-step", 0, CL_MAX,
                    m -> m.end().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-')),
            key("stalled_span_fraction", NONE, "span past its section peak",
                    "share of the span (outboard of the fuselage side) past its section cl peak at the maximum", 3,
                    CL_MAX, MaximumLift::stalledSpanFraction),
            key("first_stall.eta", NONE, "first past its peak at eta",
                    "the station that first passes its section cl peak, over the semi-span", 3, CL_MAX,
                    m -> m.firstStall().map(f -> (Object) f.eta()).orElse(null)),
            key("first_stall.CL", NONE, "  at wing CL", "the CL (as max_lift.CL's) when it does", 3, CL_MAX,
                    m -> m.firstStall().map(f -> (Object) f.lift()).orElse(null)),
            key("aileron.below_peak", FLAG, "ailerons below their peak",
                    "true when every aileron station is below its section cl peak at the maximum", 0, CL_MAX,
                    m -> m.aileron().map(a -> (Object) a.belowPeak()).orElse(null)),
            key("aileron.margin_dcl", NONE, "aileron margin dcl",
                    "least section peak cl - cl over the aileron span at the maximum", 3, CL_MAX,
                    m -> m.aileron().map(a -> (Object) a.margin()).orElse(null)),
            key("synthetic_curves", FLAG, "synthetic section curves",
                    "true when some section's lift curve was built from its lift slope, zero-lift angle and cl_max",
                    0, CL_MAX, MaximumLift::synthetic),
            key("multiple_solutions.from_deg", DEGREE, "second solutions from alpha",
                    "lowest angle of attack with two or more coupled solutions (the lift there depends on how the "
                            + "angle was reached)", 2, CL_MAX,
                    m -> m.multipleSolutions().map(r -> (Object) Math.toDegrees(r[0])).orElse(null)),
            key("multiple_solutions.to_deg", DEGREE, "  to alpha", "highest such angle", 2, CL_MAX,
                    m -> m.multipleSolutions().map(r -> (Object) Math.toDegrees(r[1])).orElse(null)),
            key("stall_speed_eas", METRE_PER_SECOND, "stall speed at maximum CL EAS",
                    "stall speed at the maximum CL, equivalent airspeed (wing alone)", 2,
                    Set.of(Need.CL_MAX, Need.WEIGHT), m -> m.speed().map(v -> (Object) v.equivalent()).orElse(null)),
            key("stall_speed_tas", METRE_PER_SECOND, "stall speed at maximum CL TAS",
                    "stall speed at the maximum CL, true airspeed", 2, Set.of(Need.CL_MAX, Need.WEIGHT),
                    m -> m.speed().map(v -> (Object) v.trueSpeed()).orElse(null)));

    /** The clean-and-flapped stall study. */
    public static final List<ResultKey<StallStudy>> STUDY = List.of(
            key("flap_increment_CL", NONE, "flap increment of onset CL",
                    "how much the flaps raise the stall-onset CL", 3, Set.of(Need.CL_MAX, Need.FLAPS),
                    s -> boxed(s.flapIncrement())),
            key("stall_speed.clean_eas", METRE_PER_SECOND, "stall speed clean EAS",
                    "stall speed clean, equivalent airspeed, by stall_speed.basis (wing alone)", 2,
                    Set.of(Need.CL_MAX, Need.WEIGHT), s -> boxed(s.clean().headlineEquivalent())),
            key("stall_speed.clean_tas", METRE_PER_SECOND, "stall speed clean TAS",
                    "stall speed clean, true airspeed", 2, Set.of(Need.CL_MAX, Need.WEIGHT),
                    s -> boxed(s.clean().headlineTrue())),
            key("stall_speed.flaps_eas", METRE_PER_SECOND, "stall speed flaps EAS",
                    "stall speed with flaps, equivalent airspeed, by stall_speed.basis (wing alone)", 2,
                    Set.of(Need.CL_MAX, Need.FLAPS, Need.WEIGHT),
                    s -> s.flaps().map(f -> boxed(f.headlineEquivalent())).orElse(null)),
            key("stall_speed.flaps_tas", METRE_PER_SECOND, "stall speed flaps TAS",
                    "stall speed with flaps, true airspeed", 2, Set.of(Need.CL_MAX, Need.FLAPS, Need.WEIGHT),
                    s -> s.flaps().map(f -> boxed(f.headlineTrue())).orElse(null)),
            key("stall_speed.basis", TEXT, "stall speed basis",
                    "the clean headline's: max-lift (every section gives a measured lift curve) or onset (the linear "
                            + "onset, which errs safe)", 0, Set.of(Need.CL_MAX, Need.WEIGHT),
                            s -> s.clean().speedBasis()),
            key("stall_speed.flaps_basis", TEXT, "stall speed basis with flaps",
                    "the flapped headline's basis, as stall_speed.basis", 0,
                    Set.of(Need.CL_MAX, Need.FLAPS, Need.WEIGHT),
                    s -> s.flaps().map(f -> (Object) f.speedBasis()).orElse(null)),
            key("assumed_cl_max", FLAG, "cl_max assumed",
                    "true when some section's cl_max was assumed, clean or with flaps", 0, CL_MAX,
                    StallStudy::assumedClMax));

    /** The answer of a washout search. */
    public static final List<ResultKey<WashoutDesign.Result>> WASHOUT = List.of(
            key("washout.met", FLAG, "washout meets the requirements",
                    "true when some washout within the bounds meets every stall requirement", 0, CL_MAX,
                    WashoutDesign.Result::met),
            key("washout.least_deg", DEGREE, "least washout meeting them",
                    "the least washout (root twist minus tip twist) meeting every requirement", 2, CL_MAX,
                    r -> r.washout().map(p -> (Object) Math.toDegrees(p.washout())).orElse(null)),
            key("washout.change_deg", DEGREE, "  change to the file's",
                    "that washout less the file's", 2, CL_MAX,
                    r -> r.washout().map(p -> (Object) Math.toDegrees(p.change())).orElse(null)),
            key("washout.cruise_e", NONE, "  e at the cruise CL there", "span efficiency at the cruise CL with it", 4,
                    CL_MAX, r -> r.washout().flatMap(p -> p.cruiseE().isPresent()
                            ? java.util.Optional.of((Object) p.cruiseE().getAsDouble()) : java.util.Optional.empty())
                            .orElse(null)));

    /** One trimmed point of level flight. */
    public static final List<ResultKey<Balance.TrimPoint>> TRIM = List.of(
            key("speed_eas", METRE_PER_SECOND, "EAS", "equivalent airspeed", 1, t -> t.equivalentSpeed()),
            key("speed_tas", METRE_PER_SECOND, "TAS", "true airspeed", 1, t -> t.trueSpeed()),
            key("CL", NONE, "CL", "the configuration's lift coefficient", 3, t -> t.lift()),
            key("alpha_deg", DEGREE, "alpha", "angle of attack of the wing file's x axis", 2,
                    t -> Math.toDegrees(t.alpha())),
            key("elevator_deg", DEGREE, "elevator", "elevator deflection, trailing edge down positive", 2,
                    t -> Math.toDegrees(t.elevator())),
            key("wing_CL", NONE, "wing CL", "the wing's lift coefficient on the reference area", 3,
                    t -> t.wingLift()),
            key("tail_CL", NONE, "tail CL", "the tail's (or canard's) lift coefficient on its own area", 3,
                    t -> boxed(t.pitchLift())),
            key("tail_load", NEWTON, "tail load", "the tail's (or canard's) lift, positive up", 0,
                    t -> boxed(t.pitchLoad())),
            key("CDi", NONE, "CDi", "induced drag coefficient of the configuration (Trefftz plane)", 5,
                    t -> t.inducedDrag()),
            key("CD", NONE, "CD", "CDi + CDp where every section gives a drag polar", 5, POLARS, t -> boxed(t.drag())),
            key("trim_CDi", NONE, "trim CDi", "CDi trimmed less CDi at the same CL with the elevator at zero", 5,
                    t -> t.trimDrag()),
            key("thrust", NEWTON, "thrust", "thrust equal to the drag, where a thrust line is given", 0,
                    t -> boxed(t.thrust())),
            key("within_limits", FLAG, "in travel", "true when the elevator lies within its limits", 0,
                    t -> t.withinLimits()));

    /** The configuration in balance at one centre of gravity (a tail or canard with an elevator for the trim). */
    public static final List<ResultKey<BalanceStudy>> BALANCE = List.of(
            key("cg.x", METRE, "cg x", "the centre of gravity's x in the wing file's axes", 3,
                    Set.of(Need.CG), BalanceStudy::cgX),
            key("cg.mac_fraction", NONE, "cg / MAC", "the centre of gravity behind the leading edge "
                    + "of the wing's mean aerodynamic chord, over the MAC", 3, Set.of(Need.CG),
                    BalanceStudy::cgMacFraction),
            key("neutral_point.x", METRE, "neutral point x", "the stick-fixed neutral point's x: where dCm/dCL "
                    + "vanishes at small angles of attack", 3, Set.of(Need.CG), b -> b.neutralPoint().x()),
            key("neutral_point.mac_fraction", NONE, "  as a fraction of the MAC",
                    "the neutral point behind the MAC's leading edge, over the MAC", 3, Set.of(Need.CG),
                    b -> b.neutralPoint().macFraction()),
            key("static_margin", NONE, "static margin / MAC", "neutral point less centre of gravity, over the MAC "
                    + "(positive: stable)", 3, Set.of(Need.CG), BalanceStudy::staticMargin),
            key("derivatives.CL_alpha", PER_RADIAN, "CL_alpha", "the configuration's lift slope at small angles", 4,
                    Set.of(Need.CG), b -> b.derivatives().liftSlope()),
            key("derivatives.Cm_alpha", PER_RADIAN, "Cm_alpha", "pitching-moment slope about the centre of gravity, "
                    + "the fuselage's included", 4, Set.of(Need.CG), b -> b.derivatives().momentSlope()),
            key("derivatives.CL_q", PER_RADIAN, "CL_q", "lift per radian of pitch rate q c / (2 V) about the centre "
                    + "of gravity", 4, Set.of(Need.CG), b -> b.derivatives().liftPerRate()),
            key("derivatives.Cm_q", PER_RADIAN, "Cm_q", "pitching moment per radian of q c / (2 V) (pitch damping)",
                    4, Set.of(Need.CG), b -> b.derivatives().momentPerRate()),
            key("derivatives.CL_de", PER_RADIAN, "CL_de", "lift per radian of elevator (with the handbook "
                    + "effectiveness at small deflections)", 4, Set.of(Need.CG),
                    b -> boxed(b.derivatives().liftPerElevator())),
            key("derivatives.Cm_de", PER_RADIAN, "Cm_de", "pitching moment per radian of elevator about the centre "
                    + "of gravity", 4, Set.of(Need.CG), b -> boxed(b.derivatives().momentPerElevator())),
            key("derivatives.downwash_gradient", NONE, "downwash gradient at the tail",
                    "d epsilon / d alpha at the tail from the lattice, the tail removed (area mean over the tail)", 3,
                    Set.of(Need.CG), b -> boxed(b.downwashGradient())),
            key("stall_speed_trimmed.clean_eas", METRE_PER_SECOND, "trimmed Vs clean EAS",
                    "stall speed clean, trimmed with the tail's load, power off, equivalent airspeed", 2,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.stallClean().map(s -> (Object) s.equivalentSpeed()).orElse(null)),
            key("stall_speed_trimmed.flaps_eas", METRE_PER_SECOND, "trimmed Vs flaps EAS",
                    "stall speed with flaps, trimmed, power off, equivalent airspeed", 2,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT, Need.FLAPS),
                    b -> b.stallFlaps().map(s -> (Object) s.equivalentSpeed()).orElse(null)),
            key("stall_speed_trimmed.basis", TEXT, "trimmed Vs basis",
                    "max-lift (every section gives a measured lift curve) or onset (the linear onset, which errs "
                            + "safe)", 0, Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.stallClean().map(s -> (Object) s.basis().word()).orElse(null)),
            key("stall_speed_trimmed.clean_CL", NONE, "CL at trimmed Vs",
                    "the whole configuration's CL at the trimmed clean stall (wing and tail)", 3,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.stallClean().map(s -> (Object) s.lift()).orElse(null)),
            key("elevator_at_stall.clean_deg", DEGREE, "elevator at Vs clean",
                    "the elevator deflection that trims the clean stall (trailing edge down positive)", 2,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.stallClean().map(s -> (Object) Math.toDegrees(s.elevator())).orElse(null)),
            key("elevator_at_stall.flaps_deg", DEGREE, "elevator at Vs flaps",
                    "the elevator deflection that trims the flapped stall", 2,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT, Need.FLAPS),
                    b -> b.stallFlaps().map(s -> (Object) Math.toDegrees(s.elevator())).orElse(null)),
            key("elevator_at_stall.within_limits", FLAG, "elevator in travel",
                    "true when the elevator reaches both trims within its limits", 0,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.stallClean().map(s -> (Object) (s.withinLimits()
                            && b.stallFlaps().map(Balance.TrimmedStall::withinLimits).orElse(true))).orElse(null)),
            key("forward_limit.x", METRE, "forward limit of the centre of gravity x",
                    "the most forward centre of gravity at which the elevator at its up stop trims the stall (with "
                            + "the flaps when deflected), power off", 3, Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> boxed(b.forwardLimit())),
            key("forward_limit.mac_fraction", NONE, "  as a fraction of the MAC", "that limit over the MAC", 3,
                    Set.of(Need.CG, Need.CL_MAX, Need.WEIGHT),
                    b -> b.forwardLimit().isPresent() ? (Object) b.clean().macFraction(b.forwardLimit().getAsDouble())
                            : null));

    /** One load case of the spanwise loads (limit loads unless a safety factor was applied). */
    public static final List<ResultKey<SpanwiseLoads>> LOADS = List.of(
            key("dynamic_pressure", PASCAL, "dynamic pressure", "q = rho0 Ve^2 / 2 of the case", 0,
                    SpanwiseLoads::dynamicPressure),
            key("CN", NONE, "wing CN", "normal-force coefficient about the longitudinal axis, n W / (q S)", 3,
                    SpanwiseLoads::normalCoefficient),
            key("CL", NONE, "wing CL", "the wing's lift coefficient in the case", 3, SpanwiseLoads::liftCoefficient),
            key("CD", NONE, "wing CD", "the wing's drag coefficient in the case, induced plus profile", 4,
                    SpanwiseLoads::dragCoefficient),
            key("CC", NONE, "wing CC", "chordwise-force coefficient along the longitudinal axis, positive aft", 4,
                    SpanwiseLoads::chordCoefficient),
            key("alpha_deg", DEGREE, "alpha", "the angle of attack of the case (of the file's x axis)", 2,
                    l -> Math.toDegrees(l.alpha())),
            key("root.shear", NEWTON, "root shear", "shear at the root of one half-wing, positive up", 0,
                    SpanwiseLoads::rootShear),
            key("root.bending", NEWTON_METRE, "root bending", "bending at the root of one half-wing, positive "
                    + "up-bending", 0, SpanwiseLoads::rootBending),
            key("root.torsion", NEWTON_METRE, "root torsion", "torsion at the root of one half-wing, positive "
                    + "nose-up", 0, SpanwiseLoads::rootTorsion),
            key("root.chord_shear", NEWTON, "root chord shear", "in-plane shear at the root, positive aft", 0,
                    l -> l.chordShear()[0]),
            key("root.chord_bending", NEWTON_METRE, "root chord bending",
                    "in-plane bending at the root, positive for an aft load outboard", 0, l -> l.chordBending()[0]),
            key("root.normal_load", NEWTON, "root normal load",
                    "the half-wing's normal force less n g times its mass, normal to the longitudinal axis", 0,
                    SpanwiseLoads::normalLoad));

    /** A control's geometry. */
    public static final List<ResultKey<ControlGeometry>> CONTROL = List.of(
            key("from", METRE, "inner end y", "the control's inner end", 3, c -> c.control().from()),
            key("to", METRE, "outer end y", "the control's outer end", 3, c -> c.control().to()),
            key("from_eta", NONE, "inner end eta", "the inner end over the semi-span", 3,
                    c -> c.control().from() / c.semiSpan()),
            key("to_eta", NONE, "outer end eta", "the outer end over the semi-span", 3,
                    c -> c.control().to() / c.semiSpan()),
            key("chord_fraction", NONE, "chord fraction", "the control's chord over the local chord", 3,
                    c -> c.control().chordFraction()),
            key("deflection_deg", DEGREE, "deflection", "the file's deflection, trailing edge down", 2,
                    c -> Math.toDegrees(c.control().deflection())));

    /**
     * The table labels of keys that call the configuration's CL the wing's, as a wing alone has it, for a wing
     * file with other surfaces besides the wing (same key, unit and value; see {@link #forSeveralSurfaces}).
     */
    private static final List<ResultKey<?>> CONFIGURATION_LABELS = List.of(
            relabelled(find(ONSET, "CL"), "configuration CL at onset"),
            relabelled(find(MAX_LIFT, "CL"), "maximum wing CL"));

    private Vocabulary() {
    }

    /**
     * The key as a table labels it where the wing file has other surfaces besides the wing: the onset's CL is
     * then the configuration's (untrimmed), while the lift traced through the stall is the wing's own (the
     * other surfaces stay linear), so their labels say which; any other key as it is.
     */
    @SuppressWarnings("unchecked")
    public static <S> ResultKey<S> forSeveralSurfaces(ResultKey<S> key) {
        for (ResultKey<?> k : CONFIGURATION_LABELS) {
            if (k.value() == key.value()) {
                return (ResultKey<S>) k;
            }
        }
        return key;
    }

    /**
     * The key named {@code name} in a group.
     *
     * @throws IllegalArgumentException when the group has no such key (a writer's mistake, not the user's)
     */
    public static <S> ResultKey<S> find(List<ResultKey<S>> group, String name) {
        return lookup(group, name).orElseThrow(() -> new IllegalArgumentException("no result key '" + name + "'"));
    }

    /** The key named {@code name} in a group, if it has one. */
    public static <S> Optional<ResultKey<S>> lookup(List<ResultKey<S>> group, String name) {
        return group.stream().filter(k -> k.key().equals(name)).findFirst();
    }

    /** Several keys of a group, in the order named. */
    public static <S> List<ResultKey<S>> select(List<ResultKey<S>> group, String... names) {
        List<ResultKey<S>> out = new ArrayList<>();
        for (String n : names) {
            out.add(find(group, n));
        }
        return List.copyOf(out);
    }

    /** The names of a group's keys, for messages. */
    public static List<String> names(List<? extends ResultKey<?>> group) {
        return group.stream().map(k -> k.key()).map(String::valueOf).toList();
    }

    private static <S> ResultKey<S> relabelled(ResultKey<S> key, String label) {
        return new ResultKey<>(key.key(), key.unit(), label, key.description(), key.decimals(), key.needs(),
                key.value());
    }

    private static int unknowns(Lattice lattice) {
        return lattice.mirrored() ? lattice.halfCount() : lattice.panelCount();
    }

    private static Object boxed(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : null;
    }


    private static <S> ResultKey<S> key(String key, ResultUnit unit, String label, String description, int decimals,
            Function<S, Object> value) {
        return new ResultKey<>(key, unit, label, description, decimals, Set.of(), value);
    }

    private static <S> ResultKey<S> key(String key, ResultUnit unit, String label, String description, int decimals,
            Set<Need> needs, Function<S, Object> value) {
        return new ResultKey<>(key, unit, label, description, decimals, needs, value);
    }
}
