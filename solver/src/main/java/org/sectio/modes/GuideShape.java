package org.sectio.modes;

/** The cross-sections whose modes have textbook indices, recognized from the walls. */
public enum GuideShape {
    /** One conductor whose walls are the four sides of an axis-aligned rectangle, homogeneous filling. */
    RECTANGULAR,
    /** One conductor whose wall is a single circle, homogeneous filling. */
    CIRCULAR,
    /** Anything else: modes are numbered within their family and classed by mirror parity. */
    OTHER
}
