package org.sectio.geometry.expr;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The expression grammar: precedence and associativity as in ordinary algebra, the functions against
 * their textbook values, and the exact position and wording of every kind of fault.
 */
class ExpressionTest {

    private static double eval(String text, Map<String, Double> values) throws ExpressionException {
        return Expression.parse(text).evaluate(values);
    }

    private static double eval(String text) throws ExpressionException {
        return eval(text, Map.of());
    }

    private static ExpressionException fault(String text) {
        return assertThrows(ExpressionException.class, () -> eval(text, Map.of("a", 2.0)));
    }

    @Test
    void multiplicationBindsTighterThanAdditionAndParenthesesOverrideIt() throws Exception {
        assertEquals(7, eval("1 + 2 * 3"));
        assertEquals(9, eval("(1 + 2) * 3"));
        assertEquals(2, eval("8 / 2 / 2"));
        assertEquals(-4, eval("1 - 2 - 3"));
    }

    @Test
    void powersAreRightAssociativeAndBindTighterThanUnaryMinus() throws Exception {
        assertEquals(512, eval("2^3^2"));
        assertEquals(-4, eval("-2^2"));
        assertEquals(0.5, eval("2^-1"));
        assertEquals(4, eval("(-2)^2"));
        assertEquals(6, eval("3 * +2"));
        assertEquals(3, eval("--3"));
    }

    @Test
    void numbersMayHaveFractionsExponentsAndNoLeadingDigit() throws Exception {
        assertEquals(0.5, eval(".5"));
        assertEquals(5.0, eval("5."));
        assertEquals(1e-3, eval("1e-3"));
        assertEquals(2.5e3, eval("2.5E+3"));
    }

    @Test
    void namedValuesAndPiAreLookedUp() throws Exception {
        assertEquals(11.43, eval("a / 2", Map.of("a", 22.86)), 1e-15);
        assertEquals(Math.PI, eval("pi"));
        assertEquals(List.of("a", "b", "a"), Expression.parse("a + sqrt(b) * a - pi").names().stream()
                .map(Expression.Name::word).toList());
    }

    @Test
    void functionsGiveTheirTextbookValues() throws Exception {
        assertEquals(3, eval("sqrt(9)"));
        assertEquals(0.5, eval("sin(pi / 6)"), 1e-15);
        assertEquals(0.5, eval("cos(pi / 3)"), 1e-15);
        assertEquals(1, eval("tan(pi / 4)"), 1e-15);
        assertEquals(3 * Math.PI / 4, eval("atan2(1, -1)"), 1e-15);
        assertEquals(2, eval("abs(-2)"));
        assertEquals(-1, eval("min(3, -1)"));
        assertEquals(3, eval("max(3, -1)"));
    }

    @Test
    void anUnknownCharacterIsReportedAtItsPosition() {
        ExpressionException e = fault("a + $");
        assertEquals(5, e.column());
        assertEquals("unexpected \"$\", expected a number, a name or \"(\"", e.problem());
    }

    @Test
    void anUnclosedParenthesisIsReportedAtTheEnd() {
        ExpressionException e = fault("(a + 1");
        assertEquals(7, e.column());
        assertEquals("the expression ends too early, expected \")\" to close the \"(\" at character 1", e.problem());
    }

    @Test
    void twoOperandsWithoutAnOperatorAreReportedAtTheSecond() {
        ExpressionException e = fault("2 a");
        assertEquals(3, e.column());
        assertEquals("unexpected \"a\", expected an operator (+ - * / ^) or the end", e.problem());
    }

    @Test
    void anEmptyExpressionIsRejected() {
        assertEquals("an empty expression, expected a number, a name or \"(\"", fault("  ").problem());
    }

    @Test
    void anExponentWithoutDigitsIsReportedAtTheE() {
        ExpressionException e = fault("1e+");
        assertEquals(2, e.column());
    }

    @Test
    void anUndefinedNameIsReportedAtItsFirstCharacterWithTheDefinedOnes() {
        ExpressionException e = fault("a * width");
        assertEquals(5, e.column());
        assertEquals("undefined parameter \"width\", expected one of \"a\" or \"pi\"", e.problem());
    }

    @Test
    void anUnknownFunctionIsReportedWithTheKnownOnes() {
        ExpressionException e = fault("1 + exp(2)");
        assertEquals(5, e.column());
        assertEquals("unknown function \"exp\", expected one of " + Function.words(), e.problem());
    }

    @Test
    void aCallWithTheWrongNumberOfArgumentsIsRejected() {
        assertEquals("atan2 takes 2 arguments, got 1", fault("atan2(1)").problem());
    }

    @Test
    void divisionByZeroIsReportedAtTheOperator() {
        ExpressionException e = fault("a / (a - 2)");
        assertEquals(3, e.column());
        assertEquals("division by zero", e.problem());
    }

    @Test
    void theSquareRootOfANegativeNumberIsNotAReal() {
        ExpressionException e = fault("1 + sqrt(-a)");
        assertEquals(5, e.column());
        assertEquals("sqrt of -2.0 is not a finite real number", e.problem());
    }
}
