package org.sectio.geometry.family;

import org.sectio.geometry.Loop;
import org.sectio.geometry.Outline;

/** A full circle as a counter-clockwise loop of four quarter arcs starting on the positive x axis. */
final class CircleLoop {

    private CircleLoop() {
    }

    /**
     * @param centreX m
     * @param centreY m
     * @param radius m, &gt; 0 (checked by the family)
     */
    static Loop of(double centreX, double centreY, double radius) {
        double q = Math.PI / 2;
        return new Loop(Outline.startAt(centreX + radius, centreY)
                .arcTo(centreX, centreY + radius, q)
                .arcTo(centreX - radius, centreY, q)
                .arcTo(centreX, centreY - radius, q)
                .arcTo(centreX + radius, centreY, q)
                .close());
    }
}
