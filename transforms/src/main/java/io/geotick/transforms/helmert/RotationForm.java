package io.geotick.transforms.helmert;

/**
 * Which rotation matrix a Helmert transformation uses.
 *
 * <p>The difference between the two is of second order in the rotations: about r²·R/2 with R ≈ 6.4e6 m,
 * i.e. 0.08 mm for r = 1″, 7 mm for r = 10″ (r in radians inside the square).
 */
public enum RotationForm {
    /**
     * The linearised matrix I + Ω (Ω skew-symmetric in the rotations), exactly as the EPSG methods
     * define it (IOGP Guidance Note 7-2, §4.3.3). Published parameter sets are estimated with this form,
     * so it is the one to use with them.
     */
    SMALL_ANGLE,
    /**
     * The orthogonal matrix R₃(rz)·R₂(ry)·R₁(rx) of the coordinate-frame convention (the position-vector
     * matrix is the same product with the rotations negated). Its first-order terms equal the small-angle
     * matrix; use it for large rotations or user parameters defined that way.
     */
    RIGOROUS
}
