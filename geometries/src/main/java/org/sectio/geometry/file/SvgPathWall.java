package org.sectio.geometry.file;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.Loop;
import org.sectio.geometry.Region;
import org.sectio.geometry.svg.SvgPathException;
import org.sectio.geometry.svg.SvgPaths;
import org.sectio.geometry.svg.SvgSubPath;

/**
 * {@code "svg_path": {"d": "M 0 0 L ...", "tolerance": t, "scale": s, "flip_y": true}}: the region of
 * SVG path data (see {@link SvgPaths} for the commands and their treatment). One user unit is
 * {@code scale} file units (default 1); y is mirrored unless {@code flip_y} is false; Bézier curves are
 * replaced by chords within {@code tolerance} file units of the curve (default 0.005 mm, written in the
 * file's units). Every sub-path is a loop, closed by a straight step if it lacks Z; the outermost must
 * enclose all the others, which become holes (for a wall: inner conductors) by the even-odd rule. A
 * fault in the path data is reported at its character inside the {@code d} string.
 */
final class SvgPathWall implements WallShape {

    /** The default chord tolerance, m. */
    static final double DEFAULT_TOLERANCE = 0.005e-3;

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        body.requireObject("an object with \"d\" and optionally \"tolerance\", \"scale\", \"flip_y\"");
        body.allowOnly("d", "tolerance", "scale", "flip_y");
        SectionNode dNode = body.get("d");
        String d = dNode.text();
        double tolerance = body.has("tolerance") ? body.get("tolerance").positiveLength() : DEFAULT_TOLERANCE;
        double scale = body.has("scale") ? body.get("scale").numberIn(Double.MIN_VALUE, Double.MAX_VALUE,
                "a positive scale (file units per SVG user unit)") : 1;
        boolean flip = !body.has("flip_y") || body.get("flip_y").bool();
        List<SvgSubPath> paths;
        try {
            paths = SvgPaths.read(d, body.unit().toMetres(scale), flip, tolerance);
        } catch (SvgPathException e) {
            throw dNode.problemInText(e.position(), "in the path data at character " + e.position() + ": "
                    + e.problem());
        }
        List<SvgSubPath> ordered = new ArrayList<>(paths);
        ordered.sort((p, q) -> Double.compare(Math.abs(q.loop().signedArea()), Math.abs(p.loop().signedArea())));
        Loop outer = ordered.get(0).loop();
        for (SvgSubPath inner : ordered.subList(1, ordered.size())) {
            var first = inner.loop().pieces().get(0);
            if (!outer.encloses(first.startX(), first.startY())) {
                throw dNode.problemInText(inner.position(), "in the path data at character " + inner.position()
                        + ": the sub-path lies outside the outermost one (at character "
                        + ordered.get(0).position() + "), expected every sub-path inside it");
            }
        }
        Region region = new Region(SvgSubPath.loops(ordered));
        Walls.requireSimple(region, dNode);
        return new ShapeRegion("SVG path of " + paths.size() + (paths.size() == 1 ? " sub-path" : " sub-paths"),
                region);
    }
}
