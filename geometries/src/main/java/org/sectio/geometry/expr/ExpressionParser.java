package org.sectio.geometry.expr;

import java.util.ArrayList;
import java.util.List;

/**
 * A recursive-descent reader of the expression grammar (one method per rule):
 *
 * <pre>
 * expression := term { ("+" | "-") term }
 * term       := signed { ("*" | "/") signed }
 * signed     := "-" signed | "+" signed | power
 * power      := primary [ "^" signed ]             (right-associative: 2^3^2 = 2^9; -2^2 = -4)
 * primary    := number | name | name "(" expression { "," expression } ")" | "(" expression ")"
 * number     := digits [ "." [digits] ] [ exponent ] | "." digits [ exponent ]
 * exponent   := ("e" | "E") [ "+" | "-" ] digits
 * name       := letter { letter | digit | "_" }    (letter: A–Z, a–z, "_")
 * </pre>
 *
 * Spaces and tabs may stand between tokens. Why our own: a geometry file comes from anyone, and a
 * parser that only knows this grammar cannot be talked into running code.
 */
final class ExpressionParser {

    private final String text;
    private int at;

    ExpressionParser(String text) {
        this.text = text;
    }

    Expression parseWhole() throws ExpressionException {
        skipSpace();
        if (at == text.length()) {
            throw fault("an empty expression, expected a number, a name or \"(\"");
        }
        Expression e = expression();
        skipSpace();
        if (at < text.length()) {
            throw fault("unexpected \"" + text.charAt(at) + "\", expected an operator (+ - * / ^) or the end");
        }
        return e;
    }

    private Expression expression() throws ExpressionException {
        Expression left = term();
        while (true) {
            skipSpace();
            if (peek('+') || peek('-')) {
                char op = text.charAt(at);
                int column = at + 1;
                at++;
                left = new Expression.Binary(op, left, term(), column);
            } else {
                return left;
            }
        }
    }

    private Expression term() throws ExpressionException {
        Expression left = signed();
        while (true) {
            skipSpace();
            if (peek('*') || peek('/')) {
                char op = text.charAt(at);
                int column = at + 1;
                at++;
                left = new Expression.Binary(op, left, signed(), column);
            } else {
                return left;
            }
        }
    }

    private Expression signed() throws ExpressionException {
        skipSpace();
        if (peek('-')) {
            int column = at + 1;
            at++;
            return new Expression.Negation(signed(), column);
        }
        if (peek('+')) {
            at++;
            return signed();
        }
        return power();
    }

    private Expression power() throws ExpressionException {
        Expression base = primary();
        skipSpace();
        if (peek('^')) {
            int column = at + 1;
            at++;
            return new Expression.Binary('^', base, signed(), column);
        }
        return base;
    }

    private Expression primary() throws ExpressionException {
        skipSpace();
        if (at == text.length()) {
            throw fault("the expression ends too early, expected a number, a name or \"(\"");
        }
        char c = text.charAt(at);
        int column = at + 1;
        if (c == '(') {
            at++;
            Expression inner = expression();
            expect(')', "\")\" to close the \"(\" at character " + column);
            return inner;
        }
        if ((c >= '0' && c <= '9') || c == '.') {
            return new Expression.Literal(number(), column);
        }
        if (isLetter(c)) {
            int begin = at;
            while (at < text.length() && (isLetter(text.charAt(at)) || (text.charAt(at) >= '0' && text.charAt(at) <= '9'))) {
                at++;
            }
            String word = text.substring(begin, at);
            skipSpace();
            if (!peek('(')) {
                return new Expression.Name(word, column);
            }
            Function function = Function.named(word).orElseThrow(() -> new ExpressionException(column,
                    "unknown function \"" + word + "\", expected one of " + Function.words()));
            at++;
            List<Expression> arguments = new ArrayList<>();
            arguments.add(expression());
            skipSpace();
            while (peek(',')) {
                at++;
                arguments.add(expression());
                skipSpace();
            }
            expect(')', "\")\" to close the call of " + word);
            if (arguments.size() != function.arity()) {
                throw new ExpressionException(column, word + " takes " + function.arity()
                        + (function.arity() == 1 ? " argument" : " arguments") + ", got " + arguments.size());
            }
            return new Expression.Call(function, arguments, column);
        }
        throw fault("unexpected \"" + c + "\", expected a number, a name or \"(\"");
    }

    private double number() throws ExpressionException {
        int begin = at;
        int digits = skipDigits();
        if (peek('.')) {
            at++;
            digits += skipDigits();
        }
        if (digits == 0) {
            at = begin;
            throw fault("a lone \".\", expected digits");
        }
        if (peek('e') || peek('E')) {
            int mark = at;
            at++;
            if (peek('+') || peek('-')) {
                at++;
            }
            if (skipDigits() == 0) {
                at = mark;
                throw fault("an exponent without digits, expected e.g. 1e-3");
            }
        }
        return Double.parseDouble(text.substring(begin, at));
    }

    private int skipDigits() {
        int begin = at;
        while (at < text.length() && text.charAt(at) >= '0' && text.charAt(at) <= '9') {
            at++;
        }
        return at - begin;
    }

    private void expect(char c, String what) throws ExpressionException {
        skipSpace();
        if (!peek(c)) {
            throw fault(at == text.length() ? "the expression ends too early, expected " + what
                    : "unexpected \"" + text.charAt(at) + "\", expected " + what);
        }
        at++;
    }

    private boolean peek(char c) {
        return at < text.length() && text.charAt(at) == c;
    }

    private void skipSpace() {
        while (at < text.length() && (text.charAt(at) == ' ' || text.charAt(at) == '\t')) {
            at++;
        }
    }

    private static boolean isLetter(char c) {
        return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || c == '_';
    }

    private ExpressionException fault(String problem) {
        return new ExpressionException(at + 1, problem);
    }
}
