package org.spanlift.vocabulary;

import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;

/**
 * A control surface with the semi-span of its surface, for its ends as fractions of the semi-span.
 *
 * @param control  the control
 * @param semiSpan the semi-span of the wing's first surface, m
 */
public record ControlGeometry(ControlSurface control, double semiSpan) {

    /** The named control of a wing (its first surface's semi-span). */
    public static ControlGeometry of(Wing wing, ControlSurface control) {
        var main = wing.main();
        double semi = main.mirrored() ? main.planform().yEnd()
                : 0.5 * (main.planform().yEnd() - main.planform().yStart());
        return new ControlGeometry(control, semi);
    }
}
