package org.spanlift.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.balance.CentreOfGravity;
import org.spanlift.geometry.Wing;
import org.spanlift.input.YamlValue;
import org.spanlift.structure.LoadCase;

/**
 * A sweep, as its file describes it: the base wing (its tree, to substitute parameter values into), the
 * swept parameters and their design, the result columns, constraints and ranking, and the flight condition.
 * Read by {@code org.spanlift.io.SweepFileReader}.
 *
 * @param file        the sweep file as given
 * @param baseName    the base wing file's name as written in the sweep file
 * @param basePath    the base wing file, resolved against the sweep file's folder
 * @param baseTree    the base wing file's tree
 * @param baseWing    the base wing as read
 * @param parameters  the swept parameters
 * @param derivation  the derived values, computed per case from the swept ones (none when the file has none)
 * @param design      the cases: a full grid or a Latin hypercube
 * @param columns     every output column: those listed, those the constraints and ranking read, and the flag
 *                    column
 * @param constraints the constraints every feasible case meets
 * @param ranking     how to rank the cases, if asked
 * @param condition   the flight condition, when a weight is given
 * @param flapsDeg    the flap deflection of the flapped configuration, degrees (else the base file's)
 * @param assumeClMax the cl_max assumed for sections that give none, if asked
 * @param loadCase    the load case of the {@code loads.*} columns, if asked
 * @param centreOfGravity the centre of gravity of the {@code balance.*} columns, if given
 * @param fingerprint SHA-256 of the sweep file and the base wing file: a run's output belongs to it
 */
public record Sweep(String file, String baseName, Path basePath, YamlValue baseTree, Wing baseWing,
        List<Parameter> parameters, Derivation derivation, Design design, List<ResultColumn> columns,
        List<Constraint> constraints, Optional<Ranking> ranking, Optional<FlightCondition> condition,
        OptionalDouble flapsDeg,
        OptionalDouble assumeClMax, Optional<LoadCase> loadCase, Optional<CentreOfGravity> centreOfGravity,
        String fingerprint) {

    /** Copies the lists. */
    public Sweep {
        parameters = List.copyOf(parameters);
        columns = List.copyOf(columns);
        constraints = List.copyOf(constraints);
    }

    /**
     * The wing tree of a case: the base tree with the swept values, then the derived values, at their paths.
     *
     * @param values  the case's swept values, in parameter order
     * @param derived the case's derived values ({@link Derivation#values}), in entry order
     * @throws ParameterPath.PathException when the base file lacks what a path needs
     */
    public YamlValue caseTree(String[] values, double[] derived) {
        YamlValue tree = baseTree;
        for (int p = 0; p < parameters.size(); p++) {
            tree = parameters.get(p).apply(tree, values[p]);
        }
        return derivation.apply(tree, derived);
    }
}
