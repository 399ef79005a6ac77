package org.spanlift.batch;

import org.spanlift.sweep.Parameter;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

/**
 * The outcome of one case: its index in the design, its stable id, its parameter values, and either its
 * results (aligned with the sweep's columns; a {@code Double}, a {@code Boolean} flag, or null where a value
 * does not exist, such as e near zero lift) or the error that stopped it.
 *
 * @param index    the case's index in the design
 * @param id       its stable id, {@value #ID_LENGTH} hex digits
 * @param values   its parameter values, as text
 * @param derived  the case's derived values in the sweep's entry order (empty without derived entries), or null
 *                 when they could not be computed (the error says why)
 * @param results  its results, aligned with the sweep's columns (all null when it failed)
 * @param feasible whether the case meets every constraint; null without constraints or when it failed
 * @param error    the error that stopped it, or null
 */
public record CaseResult(long index, String id, String[] values, double[] derived, Object[] results, Boolean feasible,
        String error) {

    /** Hex digits of a case id (64 bits of SHA-256). */
    public static final int ID_LENGTH = 16;

    /** True when an error stopped the case. */
    public boolean failed() {
        return error != null;
    }

    /**
     * The stable id of a case: the first 64 bits of SHA-256 over {@code key=value} lines, one per parameter
     * (the key is its path, or a study variable's name), so it depends on the parameter values alone (not on
     * the case's index, the design or the derived values, which follow from them).
     */
    public static String id(List<Parameter> parameters, String[] values) {
        return id(parameters.stream().map(Parameter::key).toArray(String[]::new), values);
    }

    /**
     * The same id from the parameters' paths as written ({@code surfaces.wing.trapezoid.taper}), for a reader
     * that has a results file's columns but not the sweep.
     */
    public static String id(String[] paths, String[] values) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (int p = 0; p < paths.length; p++) {
                md.update((paths[p] + "=" + values[p] + "\n").getBytes(StandardCharsets.UTF_8));
            }
            return HexFormat.of().formatHex(md.digest()).substring(0, ID_LENGTH);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }
}
