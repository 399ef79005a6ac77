package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * An option that does not apply is refused with a reason (exit 2, one line), never accepted and ignored; and
 * every angle option takes the same forms.
 */
class OptionsThatDoNotApplyTest {

    private static final String TRAINER = CliRun.demo("trainer.wing.yaml");

    private static void refused(CliRun r, String... fragments) {
        assertEquals(2, r.exitCode(), r.out() + r.err());
        assertEquals("", r.out());
        assertEquals(1, r.err().lines().count(), r.err());
        for (String f : fragments) {
            assertTrue(r.err().contains(f), "'" + f + "' in: " + r.err());
        }
    }

    @Test
    void stallRefusesASpeed() {
        refused(CliRun.of("stall", TRAINER, "--weight", "750kg", "--speed", "60kt"), "--speed", "does not apply",
                "stall speed");
        refused(CliRun.of("stall", TRAINER, "--true-speed", "60kt"), "--true-speed", "does not apply");
    }

    @Test
    void loadsRefuseATemperatureOffset() {
        refused(CliRun.of("loads", TRAINER, "--weight", "750kg", "--speed", "110kt", "--isa-offset", "15K"),
                "--isa-offset", "does not apply");
    }

    @Test
    void solveRefusesALoadFactorWithoutAWeight() {
        refused(CliRun.of("solve", TRAINER, "--load-factor", "2"), "--load-factor", "--weight");
    }

    @Test
    void unitsDoNotApplyToJsonOrCsv() {
        refused(CliRun.of("solve", TRAINER, "--units", "us", "--format", "json"), "--units", "always SI");
        refused(CliRun.of("stall", TRAINER, "--units", "si", "--format", "json"), "--units", "always SI");
    }

    @Test
    void everyAngleOptionTakesTheSameForms() {
        for (String good : new String[] {"20", "20.0", "2e1", "20deg", "+20"}) {
            assertEquals(0, CliRun.of("solve", TRAINER, "--flaps", good, "--alpha", "4").exitCode(), good);
            assertEquals(0, CliRun.of("solve", TRAINER, "--deflect", "flap=" + good, "--alpha", "4").exitCode(), good);
            assertEquals(0, CliRun.of("solve", TRAINER, "--alpha", good.replace("20", "4")).exitCode(), good);
        }
        for (String bad : new String[] {"0x1p4", "20d", "20f", "twenty", "NaN", "Infinity"}) {
            refused(CliRun.of("solve", TRAINER, "--flaps", bad), "--flaps", "degrees");
            refused(CliRun.of("solve", TRAINER, "--deflect", "flap=" + bad), "--deflect flap", "degrees");
            refused(CliRun.of("solve", TRAINER, "--alpha", bad), "--alpha");
        }
    }

    @Test
    void emptyAndOverlongAngleListsAreRefused() {
        refused(CliRun.of("solve", TRAINER, "--alpha", ","), "--alpha");
        refused(CliRun.of("solve", TRAINER, "--alpha", "0:1:1e-300"), "--alpha", "at most");
        refused(CliRun.of("solve", TRAINER, "--alpha", "0:1e308:1e-308"), "--alpha");
    }

    @Test
    void plainNumberOptionsTakeTheFilesNumberSyntax() {
        for (String bad : new String[] {"0x1p0", "1d", "0.5f", "NaN"}) {
            refused(CliRun.of("solve", TRAINER, "--cl", bad), "--cl");
            refused(CliRun.of("compare", TRAINER, TRAINER, "--cl", bad), "--cl");
            refused(CliRun.of("stall", TRAINER, "--assume-cl-max=" + bad), "--assume-cl-max");
            refused(CliRun.of("loads", TRAINER, "--weight", "750kg", "--speed", "110kt", "--safety-factor", bad),
                    "--safety-factor");
        }
        assertEquals(0, CliRun.of("solve", TRAINER, "--cl", "5e-1").exitCode());
    }
}
