package org.spanlift.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallSpeed;
import org.spanlift.stall.StripLimits;

/**
 * The configuration in balance: the neutral point, the pitch derivatives against classical estimates, the trim
 * equations, and the trimmed stall.
 */
class BalanceTest {

    private static final FlightCondition SEA_LEVEL_750_KG = new FlightCondition(750 * 9.80665, 1,
            StandardAtmosphere.at(0, 0), OptionalDouble.empty());

    /** A flat straight wing of span 10 m and chord 1 m (aspect ratio 10), with an optional tail behind it. */
    private static String wingText(String tail, String extra) {
        return """
                name: balance test
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10, root-chord: 1, taper: 1, sweep: 0}
                    lattice: {strips: 20, rows: 4}
                """ + tail + extra;
    }

    private static final String TAIL = """
              - name: tail
                role: tail
                trapezoid: {span: 3.6, root-chord: 0.7, taper: 1, sweep: 0, root-nose: [%s, 0.6]}
                controls:
                  - {name: elevator, kind: elevator, from: 0, to: 1.8, chord-fraction: 0.4, limits: [-25, 15]}
                lattice: {strips: 12, rows: 4}
            """;

    private static Wing wing(String text) {
        return WingFileReader.parse(text, "test.wing.yaml");
    }

    private static Balance balance(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        return Balance.of(a, a.fileDeflections());
    }

    @Test
    void aStraightWingOfHighAspectRatioHasItsNeutralPointNearTheQuarterChord() {
        // Thin-airfoil theory puts the aerodynamic centre at the quarter chord (Glauert, The Elements of
        // Aerofoil and Airscrew Theory, 1926); an unswept wing of aspect ratio 10 keeps it there closely.
        Balance b = balance(wing(wingText("", "")));
        assertEquals(0.25, b.neutralPoint().macFraction(), 0.01);
    }

    @Test
    void aboutTheNeutralPointTheMomentHasNoPartOddInAngleOfAttack() {
        // Flat surfaces: the circulation is sin(alpha) times one basis, so about the neutral point the moment is
        // even in alpha (the tail's lift, tilted back with the freestream, acts at its height above the point:
        // a nose-down moment of order alpha squared). Its odd part vanishes at any angle, not only near zero.
        Balance b = balance(wing(wingText(TAIL.formatted(4.5), "")));
        Vec3 np = b.centreAt(b.neutralPoint().x());
        WingAnalysis a = b.analysis();
        for (double deg : new double[] {2, 6}) {
            double up = a.solve(Math.toRadians(deg), b.deflectionsWith(0)).about(np).coefficients().pitchingMoment();
            double down = a.solve(Math.toRadians(-deg), b.deflectionsWith(0)).about(np).coefficients()
                    .pitchingMoment();
            assertEquals(0, up - down, 1e-9, "at " + deg + " degrees");
            assertTrue(up < 0, "the tail's tilted lift above the point pitches nose down: " + up);
        }
    }

    @Test
    void aTailBehindMovesTheNeutralPointAftAndALongerArmMovesItFurther() {
        double alone = balance(wing(wingText("", ""))).neutralPoint().macFraction();
        double near = balance(wing(wingText(TAIL.formatted(3.5), ""))).neutralPoint().macFraction();
        double far = balance(wing(wingText(TAIL.formatted(5.5), ""))).neutralPoint().macFraction();
        assertTrue(alone < near && near < far, alone + " < " + near + " < " + far);
    }

    @Test
    void theStaticMarginIsTheNeutralPointAheadOfTheCentreOfGravityInMacs() {
        Balance b = balance(wing(wingText(TAIL.formatted(4.5), "")));
        double x = b.macPoint(0.2);
        assertEquals((b.neutralPoint().x() - x) / b.meanAerodynamicChord(), b.staticMargin(x), 1e-15);
        assertEquals(b.neutralPoint().macFraction() - 0.2, b.staticMargin(x), 1e-12);
    }

    @Test
    void theMomentSlopeAboutACentreOfGravityIsMinusTheStaticMarginTimesTheLiftSlope() {
        // Cm_alpha = -(h_n - h) CL_alpha, the definition of the neutral point (Etkin and Reid, Dynamics of Flight,
        // 1996, chapter 2, recalled).
        Balance b = balance(wing(wingText(TAIL.formatted(4.5), "")));
        double x = b.macPoint(0.3);
        Balance.PitchDerivatives d = b.derivatives(x);
        assertEquals(-b.staticMargin(x) * b.meanAerodynamicChord() / 1.0 * d.liftSlope(), d.momentSlope(), 1e-6);
    }

    @Test
    void aLoneTailFarBehindTheCentreOfGravityDampsPitchAsThinAirfoilTheorySays() {
        // A tail alone, about 20 of its chords behind the centre of rotation, on its own reference: a unit
        // q c/(2V) turns the air at a point l behind the centre by 2 l / c. Thin-airfoil theory gives a plate the
        // lift of the incidence at its three-quarter chord (the three-quarter-chord property of thin-airfoil
        // theory, recalled), acting at its quarter chord: CL_q = 2 a_t l_3/4 / c and Cm_q = -CL_q l_1/4 / c. The
        // classical tail estimate (Etkin and Reid, Dynamics of Flight, 1996, recalled) takes l_1/4 for both and
        // is low by about c / (2 l), 2.5 per cent here.
        String text = """
                name: lone tail
                units: m
                reference: {moment-point: [-14, 0, 0]}
                surfaces:
                  - name: tail
                    trapezoid: {span: 3.6, root-chord: 0.7, taper: 1, sweep: 0}
                    lattice: {strips: 12, rows: 4}
                """;
        Balance b = balance(wing(text));
        double c = 0.7;
        double quarter = 14 + 0.25 * c;
        double threeQuarter = 14 + 0.75 * c;
        Balance.PitchDerivatives d = b.derivatives(-14);
        double at = d.liftSlope();
        double liftPerRate = 2 * at * threeQuarter / c;
        assertEquals(liftPerRate, d.liftPerRate(), 0.002 * liftPerRate);
        assertEquals(-liftPerRate * quarter / c, d.momentPerRate(), 0.002 * liftPerRate * quarter / c);
        double classical = -2 * at * (quarter / c) * (quarter / c);
        assertEquals(classical, d.momentPerRate(), 0.03 * Math.abs(classical));
    }

    @Test
    void theTailsShareOfPitchDampingIsNearTheClassicalTailEstimate() {
        // Cm_q (tail) = -2 a_t V_H l_t / c (Etkin and Reid, Dynamics of Flight, 1996, recalled), with a_t from the
        // tail alone on its own area and l_t from the centre of gravity to the tail's quarter chord. The estimate
        // ignores the wing's own response to the rate and the downwash it sends to the tail: within 10 per cent.
        double tailX = 4.5;
        Balance withTail = balance(wing(wingText(TAIL.formatted(tailX), "")));
        Balance alone = balance(wing(wingText("", "")));
        double x = withTail.macPoint(0.25);
        double tailShare = withTail.derivatives(x).momentPerRate() - alone.derivatives(x).momentPerRate();
        Balance tailAlone = balance(wing("""
                name: tail alone
                units: m
                surfaces:
                  - name: tail
                    trapezoid: {span: 3.6, root-chord: 0.7, taper: 1, sweep: 0}
                    lattice: {strips: 12, rows: 4}
                """));
        double at = tailAlone.derivatives(0).liftSlope();
        double st = 3.6 * 0.7;
        double lt = tailX + 0.25 * 0.7 - x;
        double vh = st * lt / (10 * 1.0);
        double classical = -2 * at * vh * lt / 1.0;
        assertEquals(classical, tailShare, 0.10 * Math.abs(classical), "lattice " + tailShare);
    }

    @Test
    void aTrimmedPointBalancesTheMomentAndTheWeightToOneInABillion() {
        Wing w = WingFileReader.read(java.nio.file.Path.of("../geometries/trainer-tail.wing.yaml"));
        Balance b = balance(w);
        double x = b.macPoint(0.25);
        for (double ve : new double[] {32, 45, 60}) {
            Balance.TrimPoint t = b.trim(x, ve, SEA_LEVEL_750_KG);
            Solution s = t.solution();
            double q = 0.5 * FlightCondition.seaLevelDensity() * ve * ve;
            double area = w.reference().area();
            double re = t.trueSpeed() / SEA_LEVEL_750_KG.atmosphere().kinematicViscosity();
            double cd = s.coefficients().inducedDrag() + ProfileDrag.coefficient(s, w, re).orElseThrow();
            double h = w.thrustLineHeight().orElseThrow();
            double cm = s.about(b.centreAt(x)).coefficients().pitchingMoment()
                    + b.fuselageSlope().orElseThrow() * t.alpha() - cd * h / w.reference().chord();
            double lift = (s.coefficients().lift() + cd * Math.sin(t.alpha())) * q * area;
            assertEquals(0, cm, 1e-9, "Cm at " + ve + " m/s");
            assertEquals(SEA_LEVEL_750_KG.weight(), lift, 1e-9 * SEA_LEVEL_750_KG.weight(), "lift at " + ve);
            assertEquals(cd * q * area, t.thrust().orElseThrow(), 1e-9 * cd * q * area, "thrust = drag");
            assertEquals(t.wingLift() * q * area + t.pitchLoad().orElseThrow(), s.coefficients().lift() * q * area,
                    1e-9 * SEA_LEVEL_750_KG.weight(), "the surfaces' lifts add up");
        }
    }

    @Test
    void aForwardCentreOfGravityNeedsMoreUpElevatorAndMoreTailDownload() {
        Wing w = WingFileReader.read(java.nio.file.Path.of("../geometries/trainer-tail.wing.yaml"));
        Balance b = balance(w);
        Balance.TrimPoint aft = b.trim(b.macPoint(0.30), 40, SEA_LEVEL_750_KG);
        Balance.TrimPoint fwd = b.trim(b.macPoint(0.15), 40, SEA_LEVEL_750_KG);
        assertTrue(fwd.elevator() < aft.elevator(), fwd.elevator() + " < " + aft.elevator());
        assertTrue(fwd.pitchLoad().orElseThrow() < aft.pitchLoad().orElseThrow());
    }

    @Test
    void theTailsDownloadRaisesTheTrimmedStallSpeedAboveTheWingAlone() {
        Wing w = WingFileReader.read(java.nio.file.Path.of("../geometries/trainer-tail.wing.yaml"));
        Balance b = balance(w);
        double x = b.macPoint(0.15);
        StripLimits limits = StripLimits.of(w, b.analysis().lattice(), b.deflectionsWith(0), OptionalDouble.empty());
        Balance.TrimmedStall trimmed = b.trimmedStall(x, limits, SEA_LEVEL_750_KG, Balance.StallBasis.ONSET);
        Wing alone = new Wing(w.name(), w.displayUnit(), w.reference(), java.util.List.of(w.main()), w.sections());
        WingAnalysis a = WingAnalysis.of(alone);
        StallSpeed wingAlone = StallSpeed.of(a, new double[2],
                StripLimits.of(alone, a.lattice(), new double[2], OptionalDouble.empty()), SEA_LEVEL_750_KG);
        assertTrue(trimmed.lift() < trimmed.wingLift(), "the tail pushes down at the stall");
        assertTrue(trimmed.equivalentSpeed() > wingAlone.equivalent(),
                trimmed.equivalentSpeed() + " > " + wingAlone.equivalent());
        Solution at = b.analysis().solve(trimmed.alpha(), org.spanlift.stall.FlapLift.deflections(w,
                b.deflectionsWith(trimmed.elevator())));
        assertEquals(0, at.about(b.centreAt(x)).coefficients().pitchingMoment()
                + b.fuselageSlope().orElseThrow() * trimmed.alpha(), 1e-9, "trimmed at the stall");
    }

    @Test
    void atTheForwardLimitTheTrimmedStallNeedsTheElevatorAtItsStop() {
        Wing w = WingFileReader.read(java.nio.file.Path.of("../geometries/trainer-tail.wing.yaml"));
        Balance b = balance(w);
        StripLimits limits = StripLimits.of(w, b.analysis().lattice(), b.deflectionsWith(0), OptionalDouble.empty());
        double limit = b.forwardLimit(limits, SEA_LEVEL_750_KG, Balance.StallBasis.ONSET).orElseThrow();
        Balance.TrimmedStall at = b.trimmedStall(limit, limits, SEA_LEVEL_750_KG, Balance.StallBasis.ONSET);
        assertEquals(Math.toRadians(-25), at.elevator(), 1e-6);
        Balance.TrimmedStall ahead = b.trimmedStall(limit - 0.05, limits, SEA_LEVEL_750_KG, Balance.StallBasis.ONSET);
        assertFalse(ahead.withinLimits(), "5 cm ahead of the limit the elevator runs out");
    }

    @Test
    void withoutAnElevatorTheNeutralPointStandsAndTrimIsRefused() {
        Balance b = balance(wing(wingText("""
                  - name: tail
                    trapezoid: {span: 3.6, root-chord: 0.7, taper: 1, sweep: 0, root-nose: [4.5, 0.6]}
                """, "")));
        assertFalse(b.hasElevator());
        assertTrue(b.neutralPoint().macFraction() > 0.3);
        RefusedException e = assertThrows(RefusedException.class, () -> b.trim(b.macPoint(0.25), 40,
                SEA_LEVEL_750_KG));
        assertTrue(e.getMessage().contains("no elevator"), e.getMessage());
    }

    @Test
    void theFuselageMovesTheNeutralPointForwardByItsSlopeOverTheLiftSlope() {
        String fuselage = "fuselage: {length: 6, width: 1, nose-x: -1.5}\n";
        Balance without = balance(wing(wingText(TAIL.formatted(4.5), "")));
        Balance with = balance(wing(wingText(TAIL.formatted(4.5), fuselage)));
        double slope = with.fuselageSlope().orElseThrow();
        assertTrue(slope > 0, "destabilizing");
        double shift = slope / without.derivatives(0).liftSlope() * 1.0;
        assertEquals(without.neutralPoint().x() - shift, with.neutralPoint().x(), 1e-9);
        // K_f at the root quarter chord's position (1.75 / 6 = 0.29): w^2 L K_f / (S c) per degree.
        double kf = FuselageMoment.factor(1.75 / 6);
        assertEquals(Math.toDegrees(kf * 1 * 1 * 6 / (10 * 1.0)), slope, 1e-12);
        assertTrue(Optional.of(kf).get() > 0.007 && kf < 0.010);
    }

    @Test
    void withMeasuredLiftCurvesTheTrimmedStallStandsOnTheMaximumLiftAndBalancesThere() {
        // Demo section data (invented): a lift curve through the stall, zero lift at -2 degrees, peak 1.45 at 15.
        Wing w = wing("""
                name: curves and tail
                units: m
                surfaces:
                  - name: wing
                    section: main
                    trapezoid: {span: 9.6, root-chord: 1.45, taper: 0.6, sweep: 0, washout: 2}
                    lattice: {strips: 16, rows: 4}
                  - name: tail
                    role: tail
                    trapezoid: {span: 3.2, root-chord: 0.8, taper: 1, sweep: 0, root-twist: -3, root-nose: [4.6, 0.4]}
                    controls:
                      - {name: elevator, kind: elevator, from: 0, to: 1.6, chord-fraction: 0.4, limits: [-25, 15]}
                    lattice: {strips: 8, rows: 4}
                sections:
                  main:
                    camber: NACA 2412
                    lift-curve:
                      alpha: [-8, -4, -2, 0, 4, 8, 10, 12, 13, 14, 15, 16, 17, 18, 20, 22]
                      cl: [-0.60, -0.21, 0.00, 0.21, 0.63, 1.04, 1.21, 1.34, 1.39, 1.43, 1.45, 1.43, 1.38, 1.30,
                           1.13, 1.00]
                """);
        WingAnalysis a = WingAnalysis.of(w);
        BalanceStudy study = BalanceStudy.of(a, a.fileDeflections(), CentreOfGravity.parse("30%mac"),
                Optional.of(SEA_LEVEL_750_KG), OptionalDouble.empty());
        Balance.TrimmedStall st = study.stallClean().orElseThrow(() -> new AssertionError(study.stallProblem()));
        assertEquals(Balance.StallBasis.MAX_LIFT, st.basis());
        Balance b = study.clean();
        StripLimits limits = StripLimits.of(w, a.lattice(), b.deflectionsWith(0), OptionalDouble.empty());
        double re = st.trueSpeed() / SEA_LEVEL_750_KG.atmosphere().kinematicViscosity();
        Solution top = org.spanlift.stall.CoupledLift.of(a, b.deflectionsWith(st.elevator()), limits, re)
                .maximumSolution();
        assertEquals(0, top.about(b.centreAt(study.cgX())).coefficients().pitchingMoment(), 1e-9, "balanced there");
        assertEquals(st.lift(), top.coefficients().lift(), 1e-9);
        assertEquals(SEA_LEVEL_750_KG.equivalentSpeedFor(st.lift(), w.reference()), st.equivalentSpeed(), 1e-9);
    }
}
