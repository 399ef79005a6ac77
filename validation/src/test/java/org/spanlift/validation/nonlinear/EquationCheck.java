package org.spanlift.validation.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * Checks a reported solution against the lifting-line equation from its Fourier coefficients alone, with
 * none of the solver's arrays: at each reported station eta = cos(theta), c cl = 4 b sum A_n sin(n theta)
 * (= 2 Gamma / V), the induced angle is sum n A_n sin(n theta) / sin(theta), the effective angle
 * alpha + eps - alpha_i, and the section curve must give the same cl there (Prandtl's equation with
 * section data, as stated by Sivells and Neely, NACA TN 1269, 1947). The solver converges its residuals to
 * 1e-12 of their scale; a station's cl then errs by at most that scale over the station's own
 * c sin(theta) / (4 b), a few times 1e-11 on the wings of these tests, so 1e-8 checks convergence without
 * depending on the tolerance's detail.
 */
final class EquationCheck {

    private EquationCheck() {
    }

    static void satisfies(NonlinearWing wing, NonlinearSolution s, String what) {
        LiftingLineWing planform = wing.planform();
        double b = planform.span();
        double[] a = s.fourierCoefficients();
        double[] eta = s.eta();
        double[] cl = s.sectionLift();
        double[] effective = s.effectiveAngle();
        boolean[] past = s.pastPeak();
        for (int k = 0; k < eta.length; k++) {
            double theta = eta[k] == 0.0 ? Math.PI / 2.0 : Math.acos(eta[k]);
            double sum = 0.0;
            double induced = 0.0;
            for (int j = 0; j < a.length; j++) {
                int n = 2 * j + 1;
                sum += a[j] * Math.sin(n * theta);
                induced += n * a[j] * Math.sin(n * theta);
            }
            induced /= Math.sin(theta);
            double c = planform.chord().applyAsDouble(eta[k]);
            double sectionCl = 4.0 * b * sum / c;
            double alphaEff = s.alpha() + planform.twist().applyAsDouble(eta[k]) - induced;
            SectionLiftCurve curve = wing.section().apply(eta[k]);
            String at = what + ", station eta = " + eta[k];
            assertEquals(sectionCl, cl[k], 1e-9 * Math.max(1.0, Math.abs(sectionCl)), at + ": cl from the circulation");
            assertEquals(alphaEff, effective[k], 1e-9, at + ": effective angle");
            assertEquals(sectionCl, curve.cl(alphaEff), 1e-8 * Math.max(1.0, Math.abs(sectionCl)),
                    at + ": the section curve gives the cl the circulation implies");
            assertEquals(curve.isPastPeak(alphaEff), past[k], at + ": past the peak");
        }
        assertEquals(Math.PI * planform.aspectRatio() * a[0], s.liftCoefficient(), 1e-12, what + ": CL = pi A A_1");
    }
}
