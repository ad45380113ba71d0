package io.geotick.transforms.fit;

import java.util.Locale;

/** The models a control-point fit can estimate. */
public enum SiteModelKind {
    /** 2D similarity (conformal, 4 parameters): x' = a·x − b·y + tx, y' = b·x + a·y + ty. */
    SIMILARITY_2D("similarity-2d", 2, 4, 2),
    /** 2D affine (6 parameters): x' = a1·x + a2·y + tx, y' = b1·x + b2·y + ty. */
    AFFINE_2D("affine-2d", 2, 6, 3),
    /** 3D Helmert (7 parameters: three translations, three rotations, one scale), rigorous rotation. */
    HELMERT_3D("helmert-3d", 3, 7, 3);

    private final String id;
    private final int dimension;
    private final int parameterCount;
    private final int minimumPoints;

    SiteModelKind(String id, int dimension, int parameterCount, int minimumPoints) {
        this.id = id;
        this.dimension = dimension;
        this.parameterCount = parameterCount;
        this.minimumPoints = minimumPoints;
    }

    /** The name used in files and on the command line, e.g. {@code similarity-2d}. */
    public String id() {
        return id;
    }

    /** 2 or 3: the coordinates each control point contributes as observations. */
    public int dimension() {
        return dimension;
    }

    /** The number of estimated parameters u (4, 6, 7). */
    public int parameterCount() {
        return parameterCount;
    }

    /** The fewest control points that determine the model (2, 3, 3). */
    public int minimumPoints() {
        return minimumPoints;
    }

    /**
     * Parses {@link #id()} (case-insensitive; also {@code similarity}, {@code affine}, {@code helmert}).
     *
     * @throws IllegalArgumentException naming the text when it is none of them
     */
    public static SiteModelKind parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        switch (t) {
            case "similarity-2d": case "similarity": case "conformal-2d":
                return SIMILARITY_2D;
            case "affine-2d": case "affine":
                return AFFINE_2D;
            case "helmert-3d": case "helmert": case "similarity-3d":
                return HELMERT_3D;
            default:
                throw new IllegalArgumentException("site model kind '" + text
                    + "' is none of similarity-2d, affine-2d, helmert-3d");
        }
    }
}
