package org.sectio.geometry.svg;

import java.util.List;
import org.sectio.geometry.Loop;

/**
 * One closed sub-path of SVG path data as a wall loop, in metres.
 *
 * @param loop the loop, counter-clockwise
 * @param position 1-based position of its moveto in the path data
 */
public record SvgSubPath(Loop loop, int position) {

    /** @return the loops of several sub-paths, in order */
    public static List<Loop> loops(List<SvgSubPath> paths) {
        return paths.stream().map(SvgSubPath::loop).toList();
    }
}
