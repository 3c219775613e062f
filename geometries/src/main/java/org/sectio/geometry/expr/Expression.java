package org.sectio.geometry.expr;

import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * A parsed arithmetic expression: numbers, named values, + − * / ^, unary minus, parentheses, the
 * constant {@code pi} and the calls of {@link Function}. Nothing else can be expressed, so evaluating
 * one runs no code but this arithmetic. Every node remembers the 1-based character position of its
 * text, so evaluation faults point at the operator, call or name that caused them.
 *
 * <p>Values are plain numbers: what unit they carry is decided by where the result is used.
 */
public sealed interface Expression {

    /** The name of the constant π. */
    String PI = "pi";

    /**
     * @param text the expression, e.g. {@code "a/2 + sqrt(b^2 - 1)"}
     * @return its parse tree
     * @throws ExpressionException at the first character that does not fit the grammar
     */
    static Expression parse(String text) throws ExpressionException {
        return new ExpressionParser(text).parseWhole();
    }

    /** @return the 1-based position of this node's text in the expression */
    int column();

    /**
     * @param values the named values the expression may use, other than {@code pi}
     * @return the value, finite
     * @throws ExpressionException for an unknown name, a division by zero or any non-finite result,
     *     at the position of the name or operator
     */
    double evaluate(Map<String, Double> values) throws ExpressionException;

    /** @return every named value used, in order of appearance (repeats included), {@code pi} excluded */
    default List<Name> names() {
        List<Name> found = new java.util.ArrayList<>();
        collectNames(this, found);
        return found;
    }

    private static void collectNames(Expression e, List<Name> into) {
        if (e instanceof Name n) {
            if (!n.word().equals(PI)) {
                into.add(n);
            }
        } else if (e instanceof Negation n) {
            collectNames(n.operand(), into);
        } else if (e instanceof Binary b) {
            collectNames(b.left(), into);
            collectNames(b.right(), into);
        } else if (e instanceof Call c) {
            c.arguments().forEach(a -> collectNames(a, into));
        }
    }

    /** A number written in the text. */
    record Literal(double value, int column) implements Expression {
        @Override
        public double evaluate(Map<String, Double> values) {
            return value;
        }
    }

    /** A named value: {@code pi} or a parameter. */
    record Name(String word, int column) implements Expression {
        @Override
        public double evaluate(Map<String, Double> values) throws ExpressionException {
            if (word.equals(PI)) {
                return Math.PI;
            }
            Double value = values.get(word);
            if (value == null) {
                String known = new TreeSet<>(values.keySet()).stream().map(k -> "\"" + k + "\"")
                        .collect(Collectors.joining(", "));
                throw new ExpressionException(column, "undefined parameter \"" + word + "\", expected "
                        + (known.isEmpty() ? "a number (no parameters are defined)" : "one of " + known + " or \"pi\""));
            }
            return value;
        }
    }

    /** Unary minus. */
    record Negation(Expression operand, int column) implements Expression {
        @Override
        public double evaluate(Map<String, Double> values) throws ExpressionException {
            return -operand.evaluate(values);
        }
    }

    /** A binary operation {@code left op right}, op one of {@code + - * / ^}; column is the operator's. */
    record Binary(char operator, Expression left, Expression right, int column) implements Expression {
        @Override
        public double evaluate(Map<String, Double> values) throws ExpressionException {
            double a = left.evaluate(values);
            double b = right.evaluate(values);
            double result = switch (operator) {
                case '+' -> a + b;
                case '-' -> a - b;
                case '*' -> a * b;
                case '/' -> {
                    if (b == 0) {
                        throw new ExpressionException(column, "division by zero");
                    }
                    yield a / b;
                }
                case '^' -> Math.pow(a, b);
                default -> throw new IllegalStateException("operator " + operator);
            };
            if (!Double.isFinite(result)) {
                throw new ExpressionException(column, "\"" + a + " " + operator + " " + b
                        + "\" is not a finite real number");
            }
            return result;
        }
    }

    /** A call of a built-in function; column is the function name's. */
    record Call(Function function, List<Expression> arguments, int column) implements Expression {
        public Call {
            arguments = List.copyOf(arguments);
        }

        @Override
        public double evaluate(Map<String, Double> values) throws ExpressionException {
            double[] a = new double[arguments.size()];
            for (int i = 0; i < a.length; i++) {
                a[i] = arguments.get(i).evaluate(values);
            }
            double result = function.apply(a);
            if (!Double.isFinite(result)) {
                throw new ExpressionException(column, function.word() + " of "
                        + java.util.Arrays.toString(a).replace("[", "").replace("]", "")
                        + " is not a finite real number");
            }
            return result;
        }
    }
}
