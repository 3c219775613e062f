package org.sectio.geometry.file;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.sectio.geometry.expr.Expression;
import org.sectio.geometry.expr.ExpressionException;
import org.sectio.geometry.expr.Function;

/**
 * Resolves the {@code "parameters"} object of a file: each value a number or an expression over the
 * other parameters, written in any order. Values are computed in dependency order; a name that is not
 * defined, or parameters that depend on each other in a cycle, are reported where they are written.
 */
final class ParameterTable {

    private static final Pattern NAME = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");

    private final SectionNode object;
    private final Map<String, SectionNode> nodes = new LinkedHashMap<>();
    private final Map<String, Expression> expressions = new HashMap<>();
    private final Map<String, Double> values = new LinkedHashMap<>();
    /** Parameters being evaluated, innermost last: a name met again here closes a cycle. */
    private final List<String> inProgress = new ArrayList<>();

    private ParameterTable(SectionNode object) {
        this.object = object;
    }

    /**
     * @param object the value of the {@code "parameters"} key
     * @return every parameter's value by name, in file order
     * @throws SectionFileException for a bad name, a value that is neither a number nor an expression,
     *     an expression that does not parse, an undefined name, a cycle, or a non-finite value
     */
    static Map<String, Double> resolve(SectionNode object) throws SectionFileException {
        return resolve(object, Map.of());
    }

    /**
     * @param object the value of the {@code "parameters"} key
     * @param settings values that replace those written for the same names (file units); expressions
     *     over them are computed from the new values
     * @return every parameter's value by name, in file order
     * @throws SectionFileException as {@link #resolve(SectionNode)}, and for a setting whose name the
     *     file does not define or whose value is not finite
     */
    static Map<String, Double> resolve(SectionNode object, Map<String, Double> settings)
            throws SectionFileException {
        object.requireObject("an object of named numbers or expressions, e.g. {\"a\": 22.86, \"b\": \"a/2\"}");
        ParameterTable table = new ParameterTable(object);
        table.readAll();
        for (Map.Entry<String, Double> setting : settings.entrySet()) {
            String name = setting.getKey();
            if (!table.nodes.containsKey(name)) {
                throw object.problem("no parameter \"" + name + "\" to set, expected one of "
                        + SectionNode.quoted(table.nodes.keySet().toArray(String[]::new)));
            }
            if (!Double.isFinite(setting.getValue())) {
                throw table.nodes.get(name).problem("the value set for \"" + name + "\" is " + setting.getValue()
                        + ", expected a finite number");
            }
            table.expressions.remove(name);
            table.values.put(name, setting.getValue());
        }
        for (String name : table.nodes.keySet()) {
            table.value(name);
        }
        return table.values;
    }

    private void readAll() throws SectionFileException {
        for (String name : object.keys()) {
            SectionNode node = object.get(name);
            if (!NAME.matcher(name).matches()) {
                throw node.problem("the parameter name \"" + name + "\" is not a name, expected a letter or \"_\""
                        + " followed by letters, digits or \"_\"");
            }
            if (name.equals(Expression.PI) || Function.named(name).isPresent()) {
                throw node.problem("the parameter name \"" + name + "\" is reserved for the constant or function"
                        + " of that name, expected another name");
            }
            if (node.isText()) {
                expressions.put(name, node.expression());
            } else if (!node.isNumber()) {
                throw node.problem("expected a number or an expression string, got " + node.described());
            }
            nodes.put(name, node);
        }
    }

    private double value(String name) throws SectionFileException {
        Double known = values.get(name);
        if (known != null) {
            return known;
        }
        SectionNode node = nodes.get(name);
        Expression expression = expressions.get(name);
        if (expression == null) {
            double v = node.number();
            values.put(name, v);
            return v;
        }
        inProgress.add(name);
        Map<String, Double> inputs = new HashMap<>();
        for (Expression.Name used : expression.names()) {
            String word = used.word();
            if (!nodes.containsKey(word)) {
                throw node.problemInText(used.column(), "in the expression \"" + node.text() + "\" at character "
                        + used.column() + ": undefined parameter \"" + word + "\", expected one of " + defined());
            }
            int loop = inProgress.indexOf(word);
            if (loop >= 0) {
                List<String> cycle = new ArrayList<>(inProgress.subList(loop, inProgress.size()));
                cycle.add(word);
                throw nodes.get(word).problem("the parameters depend on each other in a cycle "
                        + String.join(" → ", cycle) + ", expected each to be computable from the others");
            }
            inputs.put(word, value(word));
        }
        inProgress.remove(inProgress.size() - 1);
        double v;
        try {
            v = expression.evaluate(inputs);
        } catch (ExpressionException e) {
            throw node.problemInText(e.column(), "in the expression \"" + node.text() + "\" at character "
                    + e.column() + ": " + e.problem());
        }
        values.put(name, v);
        return v;
    }

    private String defined() {
        List<String> names = new ArrayList<>(nodes.keySet());
        names.add(Expression.PI);
        return SectionNode.quoted(names.toArray(String[]::new));
    }
}
