package org.spanlift.sweep;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;

import org.spanlift.input.Field;
import org.spanlift.input.quantity.Decimal;

/**
 * A small arithmetic expression of a sweep's {@code derived} entries, such as
 * {@code 2 * area / (span * (1 + taper))}: numbers in the one number syntax of every file ({@link Decimal}),
 * names, {@code + - * /}, powers {@code ^} (right-associative, binding tighter than a leading minus:
 * {@code -2^2} is -4, {@code 2^3^2} is 512), a leading minus, parentheses, and the functions
 * {@code sqrt}, {@code abs}, {@code sin}, {@code cos}, {@code tan} (of an angle in degrees, as the wing file
 * writes angles), {@code min} and {@code max} (two or more arguments). Nothing else: no assignment, no
 * comparison, no loops, no other functions.
 *
 * <p>The text is at most {@value #MAX_LENGTH} characters and nests at most {@value #MAX_DEPTH} levels (each
 * parenthesis, function call, leading minus and exponent opens one), so parsing and evaluation are bounded
 * whatever the file holds. The parser is a hand-written recursive descent; it resolves every name to a slot
 * when it parses, so an unknown name is refused with its position. Positions count characters from 1 in the
 * expression as written.
 *
 * <pre>
 * sum     = product { ("+" | "-") product }
 * product = signed { ("*" | "/") signed }
 * signed  = "-" signed | power
 * power   = atom [ "^" signed ]
 * atom    = number | name | function "(" sum { "," sum } ")" | "(" sum ")"
 * </pre>
 *
 * Evaluation fails with an {@link ExpressionException} at the operator or function where a value stops being
 * a finite real number: a division by zero, the square root of a negative number, the tangent of an odd
 * multiple of 90 degrees, an overflow, a power that is not real.
 */
public final class Expression {

    /** The longest expression, in characters. */
    public static final int MAX_LENGTH = 200;
    /** The deepest nesting of parentheses, function calls, leading minus signs and exponents. */
    public static final int MAX_DEPTH = 16;
    /** The functions and the number of arguments each takes (-2: two or more). */
    public static final Map<String, Integer> FUNCTIONS = Map.of("sqrt", 1, "abs", 1, "sin", 1, "cos", 1, "tan", 1,
            "min", -2, "max", -2);
    /** A name: a letter, then letters, digits or underscores, at most 32 characters. */
    public static final Pattern NAME = Pattern.compile("[A-Za-z][A-Za-z0-9_]{0,31}");

    /**
     * A parse or evaluation failure at a character of the expression (from 1); its message is
     * {@code character N: problem}.
     */
    public static final class ExpressionException extends RuntimeException {
        private static final long serialVersionUID = 1L;
        /** The character of the expression the failure is at, counted from 1. */
        private final int position;
        /** What is wrong, without the position. */
        private final String problem;

        ExpressionException(String problem, int position) {
            super("character " + position + ": " + problem);
            this.position = position;
            this.problem = problem;
        }

        /** The character of the expression the failure is at, counted from 1. */
        public int position() {
            return position;
        }

        /** What is wrong, without the position. */
        public String problem() {
            return problem;
        }

        /** The message for a file: {@code character N of the expression: problem}. */
        public String located() {
            return "character " + position + " of the expression: " + problem;
        }
    }

    private sealed interface Node permits Num, Slot, Neg, Binary, Call {
        /** The character the node starts at (an operator's or a function's own character), from 1. */
        int at();
    }

    private record Num(double value, int at) implements Node {
    }

    private record Slot(int slot, String name, int at) implements Node {
    }

    private record Neg(Node operand, int at) implements Node {
    }

    private record Binary(char op, Node left, Node right, int at) implements Node {
    }

    private record Call(String function, List<Node> args, int at) implements Node {
    }

    private final String text;
    private final Node root;
    private final Set<Integer> slots;

    private Expression(String text, Node root, Set<Integer> slots) {
        this.text = text;
        this.root = root;
        // in the order the expression first uses them: a failing case's message lists the names so, the same in
        // every JVM (Set.copyOf's order changes from one JVM to the next)
        this.slots = Collections.unmodifiableSet(new LinkedHashSet<>(slots));
    }

    /**
     * Parses an expression whose names are the keys of {@code slots}, each standing for the value at its slot
     * in the array {@link #evaluate} takes.
     *
     * @throws ExpressionException with the position of the first fault
     */
    public static Expression parse(String text, Map<String, Integer> slots) {
        if (text.length() > MAX_LENGTH) {
            throw new ExpressionException("the expression is " + text.length() + " characters long; expected at most "
                    + MAX_LENGTH, MAX_LENGTH + 1);
        }
        Parser p = new Parser(text, slots);
        Node root = p.sum();
        p.skipSpace();
        if (p.pos < text.length()) {
            throw p.unexpected("an operator (+ - * / ^) or the end of the expression");
        }
        return new Expression(text, root, p.used);
    }

    /** The expression as written. */
    public String text() {
        return text;
    }

    /** The slots of the names the expression uses, in the order it first uses them. */
    public Set<Integer> slots() {
        return slots;
    }

    @Override
    public String toString() {
        return text;
    }

    /**
     * The value with the names' values at their slots.
     *
     * @throws ExpressionException where a value stops being a finite real number
     */
    public double evaluate(double[] values) {
        return eval(root, values);
    }

    /**
     * Evaluates every part of the expression whose names all have known values, as a file is read: a
     * failure there fails every case alike, so it is refused up front.
     *
     * @param known which slots hold known values
     * @return the whole expression's value when every name it uses is known
     * @throws ExpressionException where a part with known values stops being a finite real number
     */
    public OptionalDouble fold(double[] values, boolean[] known) {
        return fold(root, values, known);
    }

    private OptionalDouble fold(Node n, double[] values, boolean[] known) {
        if (n instanceof Num num) {
            return OptionalDouble.of(num.value());
        }
        if (n instanceof Slot s) {
            return known[s.slot()] ? OptionalDouble.of(values[s.slot()]) : OptionalDouble.empty();
        }
        if (n instanceof Neg g) {
            OptionalDouble v = fold(g.operand(), values, known);
            return v.isPresent() ? OptionalDouble.of(-v.getAsDouble()) : v;
        }
        if (n instanceof Binary b) {
            OptionalDouble l = fold(b.left(), values, known);
            OptionalDouble r = fold(b.right(), values, known);
            if (l.isEmpty() || r.isEmpty()) {
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(binary(b, l.getAsDouble(), r.getAsDouble()));
        }
        Call c = (Call) n;
        double[] args = new double[c.args().size()];
        boolean all = true;
        for (int i = 0; i < args.length; i++) {
            OptionalDouble v = fold(c.args().get(i), values, known);
            all &= v.isPresent();
            args[i] = v.orElse(Double.NaN);
        }
        return all ? OptionalDouble.of(call(c, args)) : OptionalDouble.empty();
    }

    private static double eval(Node n, double[] values) {
        if (n instanceof Num num) {
            return num.value();
        }
        if (n instanceof Slot s) {
            return values[s.slot()];
        }
        if (n instanceof Neg g) {
            return -eval(g.operand(), values);
        }
        if (n instanceof Binary b) {
            return binary(b, eval(b.left(), values), eval(b.right(), values));
        }
        Call c = (Call) n;
        double[] args = new double[c.args().size()];
        for (int i = 0; i < args.length; i++) {
            args[i] = eval(c.args().get(i), values);
        }
        return call(c, args);
    }

    private static double binary(Binary b, double l, double r) {
        double v;
        switch (b.op()) {
            case '+' -> v = l + r;
            case '-' -> v = l - r;
            case '*' -> v = l * r;
            case '/' -> {
                if (r == 0) {
                    throw new ExpressionException("division by zero (" + Field.brief(l) + " / 0)", b.at());
                }
                v = l / r;
            }
            default -> {
                if (l < 0 && r != Math.rint(r)) {
                    throw new ExpressionException("a negative number to a power that is not whole ("
                            + Field.brief(l) + " ^ " + Field.brief(r) + ") is not a real number", b.at());
                }
                if (l == 0 && r < 0) {
                    throw new ExpressionException("zero to a negative power (0 ^ " + Field.brief(r)
                            + ") is a division by zero", b.at());
                }
                v = Math.pow(l, r);
            }
        }
        return finite(v, "the operator " + b.op(), b.at());
    }

    private static double call(Call c, double[] a) {
        double v = switch (c.function()) {
            case "sqrt" -> {
                if (a[0] < 0) {
                    throw new ExpressionException("the square root of a negative number (sqrt(" + Field.brief(a[0])
                            + "))", c.at());
                }
                yield Math.sqrt(a[0]);
            }
            case "abs" -> Math.abs(a[0]);
            case "sin" -> sinDeg(a[0]);
            case "cos" -> sinDeg(a[0] + 90);
            case "tan" -> {
                double cos = sinDeg(a[0] + 90);
                if (cos == 0) {
                    throw new ExpressionException("the tangent of " + Field.brief(a[0]) + " degrees is infinite",
                            c.at());
                }
                yield sinDeg(a[0]) / cos;
            }
            case "min" -> {
                double m = a[0];
                for (double x : a) {
                    m = Math.min(m, x);
                }
                yield m;
            }
            case "max" -> {
                double m = a[0];
                for (double x : a) {
                    m = Math.max(m, x);
                }
                yield m;
            }
            default -> throw new IllegalStateException("no function " + c.function());
        };
        return finite(v, c.function(), c.at());
    }

    /**
     * The sine of an angle in degrees, exact at multiples of 90 degrees (so that {@code sin(180)} is 0 and
     * {@code tan(90)} is refused rather than a huge number).
     */
    static double sinDeg(double deg) {
        if (!Double.isFinite(deg)) {
            return Double.NaN;
        }
        double r = deg % 360;
        if (r < 0) {
            r += 360;
        }
        if (r == 0 || r == 180) {
            return 0;
        }
        if (r == 90) {
            return 1;
        }
        if (r == 270) {
            return -1;
        }
        return Math.sin(Math.toRadians(r));
    }

    private static double finite(double v, String what, int at) {
        if (!Double.isFinite(v)) {
            throw new ExpressionException(what + " gives " + (Double.isNaN(v) ? "a value that is not a number"
                    : "a value beyond the range of numbers (about 1.8e308)"), at);
        }
        return v == 0 ? 0.0 : v;
    }

    /** The recursive-descent parser over one text. */
    private static final class Parser {
        private final String text;
        private final Map<String, Integer> slots;
        private final Set<Integer> used = new LinkedHashSet<>();
        private int pos;
        private int depth;

        Parser(String text, Map<String, Integer> slots) {
            this.text = text;
            this.slots = slots;
        }

        void skipSpace() {
            while (pos < text.length() && (text.charAt(pos) == ' ' || text.charAt(pos) == '\t')) {
                pos++;
            }
        }

        /** The next character after white space, or 0 at the end. */
        char peek() {
            skipSpace();
            return pos < text.length() ? text.charAt(pos) : 0;
        }

        /** Opens a level of nesting at the character {@code at}. */
        void enter(int at) {
            if (++depth > MAX_DEPTH) {
                throw new ExpressionException("the expression nests more than " + MAX_DEPTH
                        + " levels deep (parentheses, functions, signs and exponents each open one)", at);
            }
        }

        Node sum() {
            Node left = product();
            for (char c = peek(); c == '+' || c == '-'; c = peek()) {
                int at = ++pos;
                left = new Binary(c, left, product(), at);
            }
            return left;
        }

        Node product() {
            Node left = signed();
            for (char c = peek(); c == '*' || c == '/'; c = peek()) {
                int at = ++pos;
                if (peek() == '*') {
                    throw new ExpressionException("'**' is not an operator here; write powers with ^", at);
                }
                left = new Binary(c, left, signed(), at);
            }
            return left;
        }

        Node signed() {
            if (peek() == '-') {
                int at = ++pos;
                enter(at);
                Node operand = signed();
                depth--;
                return new Neg(operand, at);
            }
            return power();
        }

        Node power() {
            Node base = atom();
            if (peek() == '^') {
                int at = ++pos;
                enter(at);
                Node exponent = signed();
                depth--;
                return new Binary('^', base, exponent, at);
            }
            return base;
        }

        Node atom() {
            char c = peek();
            int at = pos + 1;
            if (c == '(') {
                pos++;
                enter(at);
                Node inner = sum();
                depth--;
                expect(')', "')' to close the '(' of character " + at);
                return inner;
            }
            if (Character.isDigit(c) || c == '.') {
                return number(at);
            }
            if (c < 128 && Character.isLetter(c)) {
                return nameOrCall(at);
            }
            throw unexpected("a number, a name, '(' or '-'");
        }

        private Node number(int at) {
            int start = pos;
            while (pos < text.length() && (Character.isDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
                pos++;
            }
            if (pos < text.length() && (text.charAt(pos) == 'e' || text.charAt(pos) == 'E')) {
                int e = pos + 1;
                if (e < text.length() && (text.charAt(e) == '+' || text.charAt(e) == '-')) {
                    e++;
                }
                if (e < text.length() && Character.isDigit(text.charAt(e))) {
                    pos = e;
                    while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                        pos++;
                    }
                }
            }
            String token = text.substring(start, pos);
            Optional<String> problem = Decimal.problem(token);
            if (problem.isPresent()) {
                throw new ExpressionException(problem.get() + ", got '" + Field.shown(token) + "'", at);
            }
            double v = Double.parseDouble(token);
            if (!Double.isFinite(v)) {
                throw new ExpressionException("the number " + Field.shown(token)
                        + " is beyond the range of numbers (about 1.8e308)", at);
            }
            return new Num(v, at);
        }

        private Node nameOrCall(int at) {
            int start = pos;
            while (pos < text.length() && isNamePart(text.charAt(pos))) {
                pos++;
            }
            String name = text.substring(start, pos);
            if (peek() == '(') {
                Integer arity = FUNCTIONS.get(name);
                if (arity == null) {
                    throw new ExpressionException("'" + Field.shown(name) + "' is not a function; expected one of "
                            + String.join(", ", new TreeSet<>(FUNCTIONS.keySet())), at);
                }
                pos++;
                enter(pos);
                List<Node> args = new ArrayList<>();
                args.add(sum());
                while (peek() == ',') {
                    pos++;
                    args.add(sum());
                }
                depth--;
                expect(')', "',' or ')' to close the call of " + name + " of character " + at);
                if (arity > 0 && args.size() != arity) {
                    throw new ExpressionException(name + " takes " + arity + " argument" + (arity == 1 ? "" : "s")
                            + ", got " + args.size(), at);
                }
                if (arity < 0 && args.size() < -arity) {
                    throw new ExpressionException(name + " takes " + -arity + " or more arguments, got "
                            + args.size(), at);
                }
                return new Call(name, args, at);
            }
            if (FUNCTIONS.containsKey(name)) {
                throw new ExpressionException("the function " + name + " needs its argument in parentheses, such as "
                        + name + "(x)", at);
            }
            Integer slot = slots.get(name);
            if (slot == null) {
                throw new ExpressionException("unknown name '" + Field.shown(name) + "'; expected "
                        + (slots.isEmpty() ? "a number (the sweep declares no names or constants)"
                        : "one of " + String.join(", ", new TreeSet<>(slots.keySet()))), at);
            }
            used.add(slot);
            return new Slot(slot, name, at);
        }

        private static boolean isNamePart(char c) {
            return c < 128 && (Character.isLetterOrDigit(c) || c == '_');
        }

        private void expect(char c, String what) {
            if (peek() != c) {
                throw unexpected(what);
            }
            pos++;
        }

        ExpressionException unexpected(String expected) {
            char c = peek();
            if (c == 0) {
                return new ExpressionException("the expression ends too soon; expected " + expected, text.length() + 1);
            }
            String shown = c >= 32 && c < 127 ? "'" + c + "'" : String.format("the character U+%04X", (int) c);
            return new ExpressionException("unexpected " + shown + "; expected " + expected, pos + 1);
        }
    }
}
