package io.geotick.transforms.helmert;

/**
 * The sign convention of the three Helmert rotations. The same physical transformation has rotations of
 * opposite sign in the two conventions; translations and scale are the same. Mixing them up moves a point
 * by about 2·r·R (r the rotation, R ≈ 6.4e6 m): 1″ makes about 60 m.
 *
 * <p>Source: IOGP Guidance Note 7-2, §4.3.3 (formulas for methods 1033/9606 and 1032/9607).
 */
public enum RotationConvention {
    /**
     * Position vector: the rotations turn the position vector in a fixed frame. Small-angle matrix
     * [[1, −rz, ry], [rz, 1, −rx], [−ry, rx, 1]]. EPSG methods 1033 (geocentric), 9606 (geog2D),
     * 1053 (time-dependent). Used by the IERS for ITRF transformations and by EUREF.
     */
    POSITION_VECTOR(1033, 9606, 1053, "Position Vector transformation"),
    /**
     * Coordinate frame rotation: the rotations turn the axes. Small-angle matrix
     * [[1, rz, −ry], [−rz, 1, rx], [ry, −rx, 1]]. EPSG methods 1032 (geocentric), 9607 (geog2D),
     * 1056 (time-dependent).
     */
    COORDINATE_FRAME(1032, 9607, 1056, "Coordinate Frame rotation");

    private final int geocentricMethod;
    private final int geographicMethod;
    private final int timeDependentMethod;
    private final String methodName;

    RotationConvention(int geocentric, int geographic, int timeDependent, String name) {
        this.geocentricMethod = geocentric;
        this.geographicMethod = geographic;
        this.timeDependentMethod = timeDependent;
        this.methodName = name;
    }

    /** EPSG method code of the geocentric-domain form (1033 or 1032). */
    public int epsgGeocentricMethod() {
        return geocentricMethod;
    }

    /** EPSG method code of the form applied to geographic 2D coordinates through ECEF (9606 or 9607). */
    public int epsgGeographicMethod() {
        return geographicMethod;
    }

    /** EPSG method code of the time-dependent form (1053 or 1056). */
    public int epsgTimeDependentMethod() {
        return timeDependentMethod;
    }

    /** The EPSG method name, e.g. "Position Vector transformation". */
    public String methodName() {
        return methodName;
    }

    /** The other convention. */
    public RotationConvention other() {
        return this == POSITION_VECTOR ? COORDINATE_FRAME : POSITION_VECTOR;
    }

    /**
     * Parses {@code position-vector} / {@code coordinate-frame} (case-insensitive; also {@code pv},
     * {@code cf}, EPSG codes 1033, 9606, 1053, 1032, 9607, 1056).
     */
    public static RotationConvention parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        switch (t) {
            case "position-vector": case "pv": case "1033": case "9606": case "1053":
                return POSITION_VECTOR;
            case "coordinate-frame": case "cf": case "1032": case "9607": case "1056":
                return COORDINATE_FRAME;
            default:
                throw new IllegalArgumentException("rotation convention '" + text
                    + "' is neither position-vector nor coordinate-frame");
        }
    }
}
