package org.spanlift.validation.nonlinear;

import java.util.Objects;
import java.util.function.DoubleFunction;
import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * A straight wing for the nonlinear lifting-line check: the planform and twist of a {@link LiftingLineWing}
 * and a section lift curve at each station.
 *
 * <p>Only the planform's span, chord, twist and reference area are used. Its section lift slope and
 * zero-lift angle belong to the linear solver and are ignored here: the section curve
 * ({@code section.apply(eta)}, eta = 2y/b from 0 at the root to 1 at the tip) stands in their place, its
 * angle being the section's effective angle of attack from its own chord line. The function must be pure.
 *
 * @param planform span, chord c(eta), twist eps(eta) [rad, positive nose-up] and reference area
 * @param section the section lift curve at each station
 */
public record NonlinearWing(LiftingLineWing planform, DoubleFunction<SectionLiftCurve> section) {

    /** @throws NullPointerException if either part is missing */
    public NonlinearWing {
        Objects.requireNonNull(planform, "planform");
        Objects.requireNonNull(section, "section");
    }

    /** A wing of one section along the whole span. */
    public static NonlinearWing uniform(LiftingLineWing planform, SectionLiftCurve section) {
        Objects.requireNonNull(section, "section");
        return new NonlinearWing(planform, eta -> section);
    }

    /** Aspect ratio b^2 / S of the planform. */
    public double aspectRatio() {
        return planform.aspectRatio();
    }
}
