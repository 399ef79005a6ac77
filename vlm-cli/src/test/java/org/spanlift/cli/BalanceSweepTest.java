package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.ResultUnit;
import org.spanlift.vocabulary.Vocabulary;

/**
 * A sweep of the tail's span with every {@code balance.*} column: each value equals what {@code balance} prints for
 * the same wing, and a larger tail moves the neutral point aft.
 */
class BalanceSweepTest {

    @TempDir
    Path dir;

    @Test
    void everyBalanceColumnEqualsTheBalanceCommandAndALargerTailAddsMargin() throws IOException {
        Path base = dir.resolve("t.wing.yaml");
        Files.copy(CliRun.GEOMETRIES.resolve("trainer-tail.wing.yaml"), base);
        StringBuilder sweep = new StringBuilder("base: t.wing.yaml\n"
                + "parameters:\n  surfaces.tail.trapezoid.span: [3.2, 3.6, 4.0]\n"
                + "flight: {weight: 750kg, flaps: 30, cg: 25%mac}\ncolumns:\n");
        Vocabulary.BALANCE.forEach(k -> sweep.append("  - ").append(Vocabulary.BALANCE_PREFIX).append(k.key())
                .append('\n'));
        Path sweepFile = Files.writeString(dir.resolve("tail.sweep.yaml"), sweep.toString());
        Path out = dir.resolve("tail.csv");
        CliRun run = CliRun.of("sweep", sweepFile.toString(), "--output", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = Files.readAllLines(out, StandardCharsets.UTF_8);
        List<String> header = List.of(lines.get(0).split(",", -1));

        CliRun printed = CliRun.of("balance", base.toString(), "--cg", "25%mac", "--weight", "750kg", "--flaps", "30",
                "--format", "json");
        assertEquals(0, printed.exitCode(), printed.err());
        YamlValue json = YamlParser.parse(printed.out(), "balance.json");
        List<String> row = List.of(lines.get(1).split(",", -1)); // span 3.2, the file's own
        assertTrue(row.get(header.indexOf("surfaces.tail.trapezoid.span")).startsWith("3.2"));
        for (ResultKey<?> k : Vocabulary.BALANCE) {
            String cell = row.get(header.indexOf(Vocabulary.BALANCE_PREFIX + k.key()));
            YamlValue value = at(json, printedPath(k.key()));
            assertNotNull(value, k.key() + " is printed");
            String p = ((YamlValue.Scalar) value).text();
            if (k.unit().numeric()) {
                double expected = Double.parseDouble(p);
                assertEquals(expected, Double.parseDouble(cell), 1e-12 * Math.max(1, Math.abs(expected)), k.key());
            } else {
                assertEquals(p, cell.replace("\"", ""), k.key());
            }
        }
        List<Double> margins = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            margins.add(Double.parseDouble(List.of(lines.get(i).split(",", -1))
                    .get(header.indexOf("balance.static_margin"))));
        }
        assertTrue(margins.get(0) < margins.get(1) && margins.get(1) < margins.get(2), "margins " + margins);
    }

    /** Where {@code balance}'s JSON prints a key for the first centre of gravity. */
    private static String printedPath(String key) {
        String group = key.substring(0, key.indexOf('.') < 0 ? key.length() : key.indexOf('.'));
        String rest = key.substring(group.length());
        return switch (group) {
            case "neutral_point", "forward_limit" -> key;
            case "static_margin" -> "static_margin.0";
            case "cg", "derivatives", "stall_speed_trimmed" -> group + ".0" + rest;
            case "elevator_at_stall" -> "stall_speed_trimmed.0." + key;
            default -> throw new AssertionError("no printed place for " + key);
        };
    }

    private static YamlValue at(YamlValue root, String dotted) {
        YamlValue v = root;
        for (String s : dotted.split("\\.")) {
            if (v instanceof YamlValue.Mapping m) {
                v = m.get(s).orElse(null);
            } else if (v instanceof YamlValue.Sequence q) {
                v = q.items().get(Integer.parseInt(s));
            } else {
                return null;
            }
            if (v == null) {
                return null;
            }
        }
        return v;
    }
}
