package org.spanlift.cli.sweep;

import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

import org.spanlift.batch.CaseResult;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Sweep;

/**
 * Checks each row of a results file read back ({@code --resume}, {@code merge}) before it is trusted: it
 * has the sweep's columns, it is the case expected next, and its id is the one its parameter values give
 * ({@link CaseResult#id}). With the sweep at hand (resume), the parameter values must also be the ones the
 * design gives that case. A bad row is named by its file and line.
 */
public final class RowCheck {

    private static final Pattern ID = Pattern.compile("[0-9a-f]{" + CaseResult.ID_LENGTH + "}");

    private final String file;
    private final RowFormat format;
    private final List<String> names;
    private final String[] paths;
    private final Sweep sweep;
    private final String advice;

    /**
     * @param file       the file, for messages
     * @param parameters how many parameter columns follow {@code case} and {@code id}
     * @param sweep      the sweep, to check the values against its design, or null
     * @param advice     what to do about a bad row, for messages
     */
    public RowCheck(String file, RowFormat format, List<String> names, int parameters, Sweep sweep, String advice) {
        this.file = file;
        this.format = format;
        this.names = List.copyOf(names);
        this.paths = names.subList(2, 2 + parameters).toArray(new String[0]);
        this.sweep = sweep;
        this.advice = advice;
    }

    /** The row's cells by column, once it is found to be case {@code expected}; else a located refusal. */
    public Map<String, String> check(String record, int line, long expected) {
        Map<String, String> row;
        try {
            row = format.parse(names, record);
        } catch (IllegalArgumentException e) {
            throw bad(line, "", "not a row of this sweep (" + e.getMessage() + ")");
        }
        String index = row.get("case");
        if (!Long.toString(expected).equals(index)) {
            throw bad(line, "case", "expected case " + expected + ", found "
                    + (index == null ? "none" : "'" + index + "'"));
        }
        String[] values = new String[paths.length];
        for (int p = 0; p < paths.length; p++) {
            values[p] = row.get(paths[p]);
            if (values[p] == null) {
                throw bad(line, paths[p], "case " + expected + " has no value for this parameter");
            }
        }
        if (sweep != null) {
            String[] design = sweep.design().values(expected);
            for (int p = 0; p < paths.length; p++) {
                if (!design[p].equals(values[p])) {
                    throw bad(line, paths[p], "case " + expected + " has the value '" + values[p]
                            + "' where this sweep "
                            + "gives '" + design[p] + "'");
                }
            }
        }
        String id = row.get("id");
        if (id == null || !ID.matcher(id).matches() || !id.equals(CaseResult.id(paths, values))) {
            throw bad(line, "id", "case " + expected + " has the id " + (id == null ? "(none)" : "'" + id + "'")
                    + ", not the one its parameter values give (" + CaseResult.id(paths, values) + ")");
        }
        String feasible = names.contains("feasible") ? row.get("feasible") : null;
        if (feasible != null && !feasible.equals("true") && !feasible.equals("false")) {
            throw bad(line, "feasible", "expected true, false or nothing, got '" + feasible + "'");
        }
        return row;
    }

    private InputException bad(int line, String field, String problem) {
        return new InputException(file, line, field, problem + "; " + advice);
    }
}
