package io.geotick.transforms.height;

/** How a geoid grid is interpolated between nodes. */
public enum Interpolation {
    /**
     * Bilinear between the four surrounding nodes: exact at nodes, continuous, first-order. Error for a
     * smooth surface about (Δ²/8)·|N''| per axis (Δ the node spacing).
     */
    BILINEAR,
    /**
     * Bicubic convolution over the surrounding 4 × 4 nodes with Keys' kernel (a = −1/2), i.e. a tensor
     * product of Catmull-Rom splines (Keys 1981, IEEE Trans. ASSP 29:1153; common practice for geoid
     * grids): exact at nodes, C¹, reproduces quadratics exactly. It needs one extra node on every side, so
     * it is unavailable in the outermost ring of cells (a clear error there, not a silent fallback).
     */
    BICUBIC
}
