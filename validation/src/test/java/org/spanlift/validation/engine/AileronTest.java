package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.validation.wings.Wings;

/**
 * Aileron sign and aileron power against strip theory. Strip theory (as in Nelson, Flight Stability and
 * Automatic Control, roll-control section; the formula recalled from memory) gives, for ailerons from y1
 * to y2 deflected antisymmetrically by delta (right trailing edge down),
 *
 * <pre>|C_l_delta| = 2 a0 tau / (S b) integral_y1^y2 c y dy</pre>
 *
 * with the section lift slope a0 = 2 pi and Glauert's two-dimensional flap effectiveness tau. (Nelson
 * writes the wing's lift slope for a0; with the section slope it is pure strip theory, every strip as in
 * 2-D.) It ignores the downwash of the antisymmetric trailing vortices, which can only reduce the rolling
 * moment, so the lattice must give less. Measured ratios lattice / strip theory: 0.51 and 0.54 (rectangle,
 * A = 8, default and 32 uniform rows), 0.60 and 0.64 (tapered, A = 8.3).
 */
class AileronTest {

    private static final double CHORD_FRACTION = 0.25;

    static Stream<Arguments> cases() {
        Trapezoid rectangle = Trapezoid.rectangle(8, 1, Wings.FLAT);
        Trapezoid tapered = new Trapezoid(10, 1.6, 0.5, Math.toRadians(3), Math.toRadians(4), 0, 0, "NACA 2412",
                0, 0);
        LatticeSpec fine = new LatticeSpec(24, 32, Spacing.COSINE, Spacing.UNIFORM);
        return Stream.of(
                Arguments.of(rectangle, 0.60, 0.95, LatticeSpec.DEFAULT),
                Arguments.of(rectangle, 0.60, 0.95, fine),
                Arguments.of(tapered, 0.55, 0.90, LatticeSpec.DEFAULT),
                Arguments.of(tapered, 0.55, 0.90, fine));
    }

    @ParameterizedTest
    @MethodSource("cases")
    void rightAileronDownRollsLeftAndStaysBelowStripTheory(Trapezoid shape, double from, double to,
            LatticeSpec lattice) {
        double s = 0.5 * shape.span();
        ControlSurface aileron = new ControlSurface("aileron", ControlKind.AILERON, from * s, to * s,
                CHORD_FRACTION, 0);
        Wing wing = Wings.of(shape.surface("wing", List.of(aileron), lattice));
        WingAnalysis analysis = WingAnalysis.of(wing);
        double delta = Math.toRadians(5);
        double withAileron = analysis.solve(0, new double[] {delta}).coefficients().rollingMoment();
        double without = analysis.solve(0, new double[] {0}).coefficients().rollingMoment();
        double perRadian = (withAileron - without) / delta;
        // Right wing up: negative in the flight-mechanics sense (positive right wing down).
        assertTrue(perRadian < 0, "C_l_delta = " + perRadian);

        double y1 = from * s;
        double y2 = to * s;
        double strip = 2 * (2 * Math.PI) * ThinAirfoil.flapEffectiveness(CHORD_FRACTION)
                * chordTimesYIntegral(shape, y1, y2) / (wing.reference().area() * wing.reference().span());
        assertTrue(-perRadian < strip, "|C_l_delta| " + -perRadian + " not below strip theory " + strip);
    }

    /** Integral of c(y) y dy over [y1, y2] for the linear chord c = c_r (1 - (1 - taper) y / s). */
    private static double chordTimesYIntegral(Trapezoid shape, double y1, double y2) {
        double s = 0.5 * shape.span();
        double k = (1 - shape.taper()) / s;
        return shape.rootChord() * ((y2 * y2 - y1 * y1) / 2 - k * (y2 * y2 * y2 - y1 * y1 * y1) / 3);
    }
}
