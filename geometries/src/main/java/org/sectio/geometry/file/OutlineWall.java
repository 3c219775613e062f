package org.sectio.geometry.file;

import java.util.List;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;

/**
 * {@code "outline": {"start": [x, y], "steps": [...]}}, each step either {@code {"line_to": [x, y]}} or
 * {@code {"arc_to": [x, y], "sweep_degrees": s}} (s positive counter-clockwise, 0 &lt; |s| &lt; 360). The
 * outline is closed with a straight step back to the start if it does not end there; the closed
 * outline must not cross or touch itself (checked by {@link Walls#requireSimple}).
 */
final class OutlineWall implements WallShape {

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        body.requireObject("an object with \"start\" and \"steps\"");
        body.allowOnly("start", "steps");
        double[] start = body.get("start").point();
        SectionNode stepsNode = body.get("steps");
        List<SectionNode> steps = stepsNode.elements("an array of steps");
        if (steps.isEmpty()) {
            throw stepsNode.problem("expected at least one step, got an empty array");
        }
        Outline outline = Outline.startAt(start[0], start[1]);
        for (SectionNode step : steps) {
            addStep(outline, step);
        }
        Region region;
        try {
            region = Region.of(outline.close());
        } catch (IllegalArgumentException e) {
            throw stepsNode.problem("the closed outline is not a valid wall: " + e.getMessage());
        }
        Walls.requireSimple(region, stepsNode);
        return new ShapeRegion("outline of " + steps.size() + (steps.size() == 1 ? " step" : " steps"), region);
    }

    private static void addStep(Outline outline, SectionNode step) throws SectionFileException {
        step.requireObject("a step {\"line_to\": [x, y]} or {\"arc_to\": [x, y], \"sweep_degrees\": s}");
        boolean line = step.has("line_to");
        boolean arc = step.has("arc_to");
        if (line == arc) {
            throw step.problem("a step needs exactly one of \"line_to\" or \"arc_to\"");
        }
        try {
            if (line) {
                step.allowOnly("line_to");
                double[] end = step.get("line_to").point();
                outline.lineTo(end[0], end[1]);
            } else {
                step.allowOnly("arc_to", "sweep_degrees");
                double[] end = step.get("arc_to").point();
                SectionNode sweepNode = step.get("sweep_degrees");
                double sweep = sweepNode.number();
                if (!(Math.abs(sweep) > 0 && Math.abs(sweep) < 360)) {
                    throw sweepNode.problem("expected a sweep between -360 and 360 degrees, not 0, got " + sweep);
                }
                outline.arcTo(end[0], end[1], Math.toRadians(sweep));
            }
        } catch (IllegalArgumentException e) {
            throw step.problem("the step ends where it starts, expected an end point different from the previous one");
        }
    }
}
