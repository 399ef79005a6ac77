package org.spanlift.cli.output;

import java.util.Optional;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.vocabulary.ResultUnit;

/**
 * The units tables show: SI (m, m^2, N, N m, kg, m/s) or US customary (ft, ft^2, lbf, ft lbf, lb, kt),
 * chosen with {@code --units} or, by default, by the wing file's length unit (m: SI; ft or in: US, lengths
 * then in the file's own unit). JSON and CSV are always SI. Conversion factors are exact by definition
 * (international foot and pound, 1959; standard gravity).
 *
 * @param system the unit system
 * @param length the unit of lengths (areas are its square)
 */
public record DisplayUnits(System system, LengthUnit length) {

    /** A unit system. */
    public enum System {
        SI, US
    }

    /** Newtons in one pound-force: 0.45359237 kg times 9.80665 m/s^2. */
    public static final double POUND_FORCE = 4.4482216152605;
    /** Kilograms in one pound. */
    public static final double POUND = 0.45359237;

    /** The system asked for, else the one the file's length unit implies. */
    public static DisplayUnits of(Optional<System> asked, LengthUnit fileUnit) {
        System s = asked.orElse(fileUnit == LengthUnit.M ? System.SI : System.US);
        LengthUnit length = s == System.SI ? LengthUnit.M : fileUnit == LengthUnit.M ? LengthUnit.FT : fileUnit;
        return new DisplayUnits(s, length);
    }

    /** SI with lengths in metres. */
    public static DisplayUnits si() {
        return new DisplayUnits(System.SI, LengthUnit.M);
    }

    public boolean us() {
        return system == System.US;
    }

    /** The symbol a table shows for a result unit; empty for ratios, counts, flags and names. */
    public String symbol(ResultUnit unit) {
        return switch (unit) {
            case METRE -> length.symbol();
            case SQUARE_METRE -> length.symbol() + "^2";
            case NEWTON -> us() ? "lbf" : "N";
            case NEWTON_METRE -> us() ? length.symbol() + " lbf" : "N m";
            case METRE_PER_SECOND -> us() ? "kt" : "m/s";
            case PASCAL -> us() ? "lbf/ft^2" : "Pa";
            case PER_RADIAN -> "/rad";
            case PER_DEGREE -> "/deg";
            case DEGREE -> "deg";
            case NONE, COUNT, FLAG, TEXT -> "";
        };
    }

    /** An SI value in the unit {@link #symbol} names. */
    public double convert(ResultUnit unit, double si) {
        return switch (unit) {
            case METRE -> si / length.metres();
            case SQUARE_METRE -> si / (length.metres() * length.metres());
            case NEWTON -> us() ? si / POUND_FORCE : si;
            case NEWTON_METRE -> us() ? si / (POUND_FORCE * length.metres()) : si;
            case METRE_PER_SECOND -> us() ? Airspeed.knots(si) : si;
            case PASCAL -> us() ? si * LengthUnit.FT.metres() * LengthUnit.FT.metres() / POUND_FORCE : si;
            default -> si;
        };
    }

    /** A mass in kg or lb. */
    public double mass(double kilograms) {
        return us() ? kilograms / POUND : kilograms;
    }

    /** The mass unit's symbol. */
    public String massSymbol() {
        return us() ? "lb" : "kg";
    }

    /** A pressure altitude as tables state it: {@code 1000 m} or {@code 3281 ft}. */
    public String altitude(double metres) {
        return us() ? TextTable.fixed(metres / LengthUnit.FT.metres(), 0) + " ft"
                : TextTable.fixed(metres, 0) + " m";
    }

    /** A force (a weight) with its unit: {@code 7355 N} or {@code 1653 lbf}. */
    public String force(double newtons) {
        return TextTable.fixed(convert(ResultUnit.NEWTON, newtons), 0) + " " + symbol(ResultUnit.NEWTON);
    }

    /**
     * A weight with its unit, and in SI also the mass it stands for under standard gravity:
     * {@code 7355 N (750.0 kg)} or {@code 1653 lbf}.
     */
    public String weight(double newtons) {
        return us() ? force(newtons) : force(newtons) + " (" + TextTable.fixed(newtons / StandardAtmosphere.G0, 1)
                + " kg)";
    }

    /** A speed with its unit: {@code 52.5 m/s} or {@code 102.0 kt}. */
    public String speed(double metresPerSecond) {
        return TextTable.fixed(convert(ResultUnit.METRE_PER_SECOND, metresPerSecond), 1) + " "
                + symbol(ResultUnit.METRE_PER_SECOND);
    }
}
