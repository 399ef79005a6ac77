package org.spanlift.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The expressions of derived sweep values: syntax, precedence, functions, bounds, and located failures. */
class ExpressionTest {

    /** Names of the tests: area (slot 0), span (slot 1), taper (slot 2). */
    private static final Map<String, Integer> SLOTS = Map.of("area", 0, "span", 1, "taper", 2);
    private static final double[] VALUES = {15.0, 10.0, 0.5};

    private static double value(String text) {
        return Expression.parse(text, SLOTS).evaluate(VALUES);
    }

    private static Expression.ExpressionException parseFailure(String text) {
        return assertThrows(Expression.ExpressionException.class, () -> Expression.parse(text, SLOTS), text);
    }

    private static Expression.ExpressionException evaluationFailure(String text, double... values) {
        Expression e = Expression.parse(text, SLOTS);
        return assertThrows(Expression.ExpressionException.class, () -> e.evaluate(values), text);
    }

    @ParameterizedTest(name = "{0} = {1}")
    @CsvSource(delimiter = '|', textBlock = """
            1 + 2 * 3            | 7
            (1 + 2) * 3          | 9
            10 - 4 - 3           | 3
            24 / 4 / 3           | 2
            2 * 3 ^ 2            | 18
            2 ^ 3 ^ 2            | 512
            (2 ^ 3) ^ 2          | 64
            -2 ^ 2               | -4
            (-2) ^ 2             | 4
            2 ^ -1               | 0.5
            --3                  | 3
            -(1 + 2)             | -3
            3 - -2               | 5
            2 * -3               | -6
            -2 * -3              | 6
            1.5e2 + .5 + 1.      | 151.5
            2E-1 * 10            | 2
            """)
    void operatorsFollowTheUsualPrecedenceWithRightAssociativePowersAboveTheSign(String text, double expected) {
        assertEquals(expected, value(text), 1e-15 * Math.abs(expected));
    }

    @Test
    void namesStandForTheValuesAtTheirSlots() {
        assertEquals(2 * 15.0 / (10.0 * 1.5), value("2 * area / (span * (1 + taper))"));
        assertEquals(2 * 15.0 / (10.0 * 1.5), value("2*area/(span*(1+taper))"), "spaces are optional");
        Expression e = Expression.parse("span ^ 2 / area + span", SLOTS);
        assertEquals(java.util.Set.of(0, 1), e.slots());
        assertEquals(100.0 / 20 + 10, e.evaluate(new double[] {20, 10, 99}));
    }

    @Test
    void functionsTakeAnglesInDegreesAndAreExactAtRightAngles() {
        assertEquals(4, value("sqrt(16)"));
        assertEquals(2.5, value("abs(-2.5)"));
        assertEquals(0.5, value("sin(30)"), 1e-15);
        assertEquals(0.5, value("cos(60)"), 1e-15);
        assertEquals(1, value("tan(45)"), 1e-15);
        assertEquals(0.0, value("sin(180)"));
        assertEquals(0.0, value("cos(90)"));
        assertEquals(0.0, value("cos(-270)"));
        assertEquals(-1.0, value("sin(-90)"));
        assertEquals(-1.0, value("cos(540)"));
        assertEquals(1, value("min(3, 1, 2)"));
        assertEquals(3, value("max(3, 1, 2)"));
        assertEquals(0.5, value("min(taper, 1)"));
        assertEquals(Math.sqrt(10.0 * 15.0), value("sqrt(span * area)"), 1e-15);
    }

    @ParameterizedTest(name = "[{index}] {0}")
    // CHECKSTYLE.OFF: LineLength
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = """
            2 * (3 + 4                 | 11 | the expression ends too soon; expected ')' to close the '(' of character 5
            2 + * 3                    | 5  | unexpected '*'; expected a number, a name, '(' or '-'
            2 3                        | 3  | unexpected '3'; expected an operator (+ - * / ^) or the end of the expression
            2 $ 3                      | 3  | unexpected '$'
            2 ** 3                     | 3  | '**' is not an operator here; write powers with ^
            +2                         | 1  | unexpected '+'; expected a number, a name, '(' or '-'
            2 * spn                    | 5  | unknown name 'spn'; expected one of area, span, taper
            exp(1)                     | 1  | 'exp' is not a function; expected one of abs, cos, max, min, sin, sqrt, tan
            1 + sqrt(1, 2)             | 5  | sqrt takes 1 argument, got 2
            max(1)                     | 1  | max takes 2 or more arguments, got 1
            sqrt 2                     | 1  | the function sqrt needs its argument in parentheses
            0x10                       | 2  | unexpected 'x'
            1_000                      | 2  | unexpected '_'
            1.2.3                      | 1  | expected a decimal number (such as 1.25 or 3e-2), got '1.2.3'
            1e1000                     | 1  | with an exponent of at most 3 digits, got '1e1000'
            1e999                      | 1  | the number 1e999 is beyond the range of numbers
            ``                         | 1  | the expression ends too soon; expected a number, a name, '(' or '-'
            area +                     | 7  | the expression ends too soon
            """)
    // CHECKSTYLE.ON: LineLength
    void aParseErrorNamesTheCharacterWhereItIs(String text, int position, String fragment) {
        Expression.ExpressionException e = parseFailure(text);
        assertEquals(position, e.position(), e.getMessage());
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
        assertEquals("character " + position + ": " + e.problem(), e.getMessage());
    }

    @Test
    void anExpressionLongerThanTheLimitIsRefusedBeforeItIsParsed() {
        String ok = "1" + " + 1".repeat((Expression.MAX_LENGTH - 1) / 4);
        assertTrue(ok.length() <= Expression.MAX_LENGTH);
        assertEquals((Expression.MAX_LENGTH - 1) / 4 + 1, value(ok));
        String tooLong = "1" + " ".repeat(Expression.MAX_LENGTH) + "+ 1";
        Expression.ExpressionException e = parseFailure(tooLong);
        assertEquals("the expression is 204 characters long; expected at most 200", e.problem());
    }

    @Test
    void nestingDeeperThanTheLimitIsRefusedWhereItGoesTooDeep() {
        int max = Expression.MAX_DEPTH;
        assertEquals(1, value("(".repeat(max) + "1" + ")".repeat(max)));
        assertEquals(1, value("-".repeat(max) + "1"));
        Expression.ExpressionException parens = parseFailure("(".repeat(max + 1) + "1" + ")".repeat(max + 1));
        assertEquals(max + 1, parens.position());
        assertTrue(parens.getMessage().contains("nests more than 16 levels deep"), parens.getMessage());
        assertEquals(max + 1, parseFailure("-".repeat(max + 1) + "1").position());
        assertEquals(2 * (max + 1), parseFailure("2^".repeat(max + 1) + "1").position(), "exponents open levels");
        String calls = "sqrt(".repeat(max + 1) + "1" + ")".repeat(max + 1);
        assertEquals(5 * (max + 1), parseFailure(calls).position(), "at the call's parenthesis");
        assertTrue(parseFailure("(".repeat(100_000)).problem().startsWith("the expression is 100000 characters"),
                "a hostile text is refused by its length before any recursion");
    }

    @ParameterizedTest(name = "{0}")
    // CHECKSTYLE.OFF: LineLength
    @CsvSource(delimiter = '|', textBlock = """
            2 * area / (span - 10)  | 10 | division by zero (30 / 0)
            sqrt(taper - 1)         | 1  | the square root of a negative number (sqrt(-0.5))
            1 + tan(span * 9)       | 5  | the tangent of 90 degrees is infinite
            1 + tan(-span * 27)     | 5  | the tangent of -270 degrees is infinite
            area ^ 300              | 6  | the operator ^ gives a value beyond the range of numbers
            1e300 * area * 1e300    | 14 | the operator * gives a value beyond the range of numbers
            (taper - 1) ^ 0.5       | 13 | a negative number to a power that is not whole (-0.5 ^ 0.5) is not a real number
            (span - 10) ^ -1        | 13 | zero to a negative power (0 ^ -1) is a division by zero
            """)
    // CHECKSTYLE.ON: LineLength
    void anEvaluationErrorNamesTheOperatorOrFunctionWhereTheValueStopsBeingFinite(String text, int position,
            String fragment) {
        Expression.ExpressionException e = evaluationFailure(text, VALUES);
        assertEquals(position, e.position(), e.getMessage());
        assertTrue(e.problem().startsWith(fragment), e.getMessage());
    }

    @Test
    void foldingEvaluatesThePartsWhoseNamesAreKnownAndRefusesTheirFailures() {
        boolean[] known = {true, true, false};
        OptionalDouble whole = Expression.parse("2 * area / span", SLOTS).fold(VALUES, known);
        assertEquals(3.0, whole.getAsDouble());
        assertFalse(Expression.parse("2 * area / (span * (1 + taper))", SLOTS).fold(VALUES, known).isPresent());
        Expression constantFault = Expression.parse("taper + 1 / (span - 10)", SLOTS);
        Expression.ExpressionException e = assertThrows(Expression.ExpressionException.class,
                () -> constantFault.fold(VALUES, known));
        assertEquals(11, e.position());
        Expression caseFault = Expression.parse("1 / (taper - 0.5)", SLOTS);
        assertFalse(caseFault.fold(VALUES, known).isPresent(), "a fault that depends on the swept value waits for the "
                + "case");
    }
}
