package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.Airspeed;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/** The maximum lift in stall's and solve's outputs, the basis of the headline stall speed, and the flaps' gain. */
class MaximumLiftOutputTest {

    private static YamlValue json(String... args) {
        CliRun r = CliRun.of(args);
        assertEquals(0, r.exitCode(), r.err());
        assertFalse(r.out().contains("NaN"), r.out());
        return YamlParser.parse(r.out(), "output.json");
    }

    private static YamlValue at(YamlValue root, String dotted) {
        YamlValue v = root;
        for (String step : dotted.split("\\.")) {
            if (v instanceof YamlValue.Mapping m) {
                v = m.get(step).orElseThrow(() -> new AssertionError("no " + dotted));
            } else {
                v = ((YamlValue.Sequence) v).items().get(Integer.parseInt(step));
            }
        }
        return v;
    }

    private static double number(YamlValue root, String dotted) {
        return Double.parseDouble(((YamlValue.Scalar) at(root, dotted)).text());
    }

    private static String text(YamlValue root, String dotted) {
        return ((YamlValue.Scalar) at(root, dotted)).text();
    }

    @Test
    void stallGivesTheMaximumLiftCleanAndWithFlapsWithItsSpreadAndTheFlapValuesUsed() {
        YamlValue r = json("stall", CliRun.demo("trainer.wing.yaml"), "--weight", "1000kgf", "--flaps", "30",
                "--format", "json");
        double clean = number(r, "max_lift.CL");
        double flaps = number(r, "max_lift_flaps.CL");
        assertTrue(flaps > clean + 0.2, "30 degrees of flap raise the maximum lift: " + clean + " -> " + flaps);
        assertTrue(clean > number(r, "stall.CL"), "the maximum lies above the linear onset");
        assertEquals("true", text(r, "max_lift.synthetic_curves"));
        assertEquals("onset", text(r, "stall_speed.basis"), "synthetic curves: the onset stays the headline");
        assertTrue(number(r, "stall_speed.clean_eas") > number(r, "max_lift.stall_speed_eas"),
                "the onset's speed, the headline, lies above the synthetic maximum's: it errs safe");
        double ratio = number(r, "max_lift_flaps.flap_model.controls.0.effectiveness_ratio")
                * number(r, "max_lift_flaps.flap_model.controls.0.large_deflection_factor");
        assertEquals(0.5, ratio, 0.05, "about half the thin-airfoil flap lift at 30 degrees (the handbook values)");
        assertTrue(number(r, "max_lift.stalled_span_fraction") > 0.1);
        YamlValue.Sequence alphas = (YamlValue.Sequence) at(r, "max_lift.progression.alpha_deg");
        YamlValue.Sequence fractions = (YamlValue.Sequence) at(r, "max_lift.progression.stalled_span_fraction");
        assertEquals(alphas.items().size(), fractions.items().size());
        assertEquals(((YamlValue.Sequence) at(r, "max_lift.strips_at_maximum.y")).items().size(),
                ((YamlValue.Sequence) at(r, "max_lift.strips_at_maximum.cl_over_cl_peak")).items().size());
    }

    @Test
    void flapsLowerTheStallSpeedBySeveralKnots() {
        YamlValue r = json("stall", CliRun.demo("trainer.wing.yaml"), "--weight", "1000kgf", "--flaps", "30",
                "--format", "json");
        double atMaximum = Airspeed.knots(number(r, "max_lift.stall_speed_eas"))
                - Airspeed.knots(number(r, "max_lift_flaps.stall_speed_eas"));
        double atOnset = Airspeed.knots(number(r, "stall_speed.clean_eas"))
                - Airspeed.knots(number(r, "stall_speed.flaps_eas"));
        assertTrue(atMaximum > 4, "at maximum lift: " + atMaximum + " kt");
        assertTrue(atOnset > 2, "at the onset: " + atOnset + " kt");
    }

    @Test
    void measuredSectionCurvesMakeTheMaximumLiftTheHeadlineStallSpeed() {
        YamlValue r = json("stall", CliRun.demo("club-low-wing.wing.yaml"), "--weight", "550kgf", "--format", "json");
        assertEquals("max-lift", text(r, "stall_speed.basis"));
        assertEquals("false", text(r, "max_lift.synthetic_curves"));
        assertEquals(number(r, "max_lift.stall_speed_eas"), number(r, "stall_speed.clean_eas"), 0);
    }

    @Test
    void aFlapBeyondTheMeasuredFlappedCurvesLeavesTheOnsetAndSaysWhyThereIsNoMaximum() {
        YamlValue r = json("stall", CliRun.demo("club-low-wing.wing.yaml"), "--weight", "550kgf", "--flaps", "30",
                "--format", "json");
        assertTrue(text(r, "max_lift_flaps.unavailable").contains("up to 20 degrees"));
        assertEquals("onset", text(r, "stall_speed.flaps_basis"));
        assertEquals("max-lift", text(r, "stall_speed.basis"));
        assertTrue(number(r, "stall_flaps.CL") > number(r, "stall.CL"), "the flapped onset is still given");
    }

    @Test
    void solveThroughTheStallAgreesWithStallOnTheMaximumAndKeepsLinearTheoryBeside() {
        YamlValue solve = json("solve", CliRun.demo("trainer.wing.yaml"), "--through-stall", "--format", "json");
        YamlValue stall = json("stall", CliRun.demo("trainer.wing.yaml"), "--format", "json");
        assertEquals(number(stall, "max_lift.CL"), number(solve, "through_stall.CL"), 0);
        YamlValue.Sequence points = (YamlValue.Sequence) at(solve, "points");
        YamlValue low = points.items().get(0);
        assertEquals(number(low, "CL_linear"), number(low, "CL"), 1e-9, "below the stall the two agree");
        YamlValue last = points.items().get(points.items().size() - 1);
        assertTrue(number(last, "CL") < number(last, "CL_linear") - 0.2, "past the stall the lift falls away");
    }

    @Test
    void optionsThatDoNotApplyAreRefused() {
        CliRun assumed = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--assume-cl-max");
        assertEquals(2, assumed.exitCode());
        assertTrue(assumed.err().contains("--through-stall"), assumed.err());
        CliRun target = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--through-stall", "--cl", "0.5");
        assertEquals(2, target.exitCode());
        assertTrue(target.err().contains("two angles of attack"), target.err());
    }
}
