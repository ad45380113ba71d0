package io.geotick.transforms.frames;

/** How a frame's coordinates behave in time. */
public enum FrameKind {
    /** A global, Earth-fixed frame in which station coordinates move with the plates (ITRF, WGS 84). */
    GLOBAL,
    /** A regional frame fixed to a tectonic plate (ETRF2000): coordinates nearly static on that plate. */
    PLATE_FIXED,
    /** A classic static datum realised by a triangulation network (ED50, OSGB 1936, NAD27, WGS 72). */
    STATIC
}
