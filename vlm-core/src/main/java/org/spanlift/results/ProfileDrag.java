package org.spanlift.results;

import java.util.List;
import java.util.OptionalDouble;

import org.spanlift.geometry.Section;
import org.spanlift.geometry.SectionBlend;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Strip;
import org.spanlift.section.ProfileDragPolar;

/**
 * Profile drag by strip integration: each strip's section drag coefficient from its sections' polars
 * (blended between stations like every section property) at the strip's cl and Reynolds number, times its
 * area: CDp = sum cd_s c_s w_s / S.
 */
public final class ProfileDrag {

    private ProfileDrag() {
    }

    /** True when every section used by the wing's surfaces has a drag polar. */
    public static boolean available(Wing wing) {
        return wing.surfaces().stream().flatMap(s -> s.planform().sectionNames().stream())
                .allMatch(n -> wing.sections().get(n).dragPolar().isPresent());
    }

    /**
     * The profile drag coefficient of the condition, or empty when some section has no polar.
     *
     * @param reynoldsPerMetre rho V / mu at the true speed (0 reads every polar at its lowest Reynolds number)
     */
    public static OptionalDouble coefficient(Solution solution, Wing wing, double reynoldsPerMetre) {
        if (!available(wing)) {
            return OptionalDouble.empty();
        }
        double sum = 0;
        for (double a : stripDragAreas(solution, wing, reynoldsPerMetre)) {
            sum += a;
        }
        return OptionalDouble.of(sum / wing.reference().area());
    }

    /**
     * Each strip's profile drag over dynamic pressure, cd c w in m^2, in lattice strip order, acting along the
     * freestream; zeros when some section has no polar (see {@link #available}).
     *
     * @param reynoldsPerMetre rho V / mu at the true speed (0 reads every polar at its lowest Reynolds number)
     */
    public static double[] stripDragAreas(Solution solution, Wing wing, double reynoldsPerMetre) {
        List<Strip> strips = solution.lattice().strips();
        double[] out = new double[strips.size()];
        if (!available(wing)) {
            return out;
        }
        double[] g = solution.stripCirculations();
        for (int k = 0; k < strips.size(); k++) {
            Strip st = strips.get(k);
            Surface surface = wing.surfaces().get(st.surface());
            double y = surface.mirrored() ? Math.abs(st.y()) : st.y();
            SectionBlend blend = surface.planform().section(y);
            ProfileDragPolar inner = polar(wing.sections().get(blend.inner()));
            ProfileDragPolar outer = polar(wing.sections().get(blend.outer()));
            double cl = 2 * g[k] / st.chord();
            double re = reynoldsPerMetre * st.chord();
            double cd = (1 - blend.weight()) * inner.cd(cl, re) + blend.weight() * outer.cd(cl, re);
            out[k] = cd * st.chord() * st.width();
        }
        return out;
    }

    private static ProfileDragPolar polar(Section s) {
        return s.dragPolar().orElseThrow();
    }
}
