package io.geotick.geodesy.angle;

/**
 * Sine and cosine of arguments in degrees, and arc tangent returning degrees, with exact argument reduction.
 *
 * <p>Why: {@code Math.sin(Math.toRadians(d))} first rounds {@code d·π/180}, an error of up to one unit in
 * the last place of the radian argument (about 1.7e-16 rad near 90°, 1 nm on the Earth's surface), before
 * the sine adds its own. Here the argument is first reduced exactly in degrees to [−45°, 45°] (a quadrant
 * shift: subtracting a multiple of 90 from a double in the range involved is exact), then converted to
 * radians with the product {@code d·(π/180)} carried in two doubles (an error-free {@link Math#fma}
 * product plus the low part of π/180), and the low part is applied as a first-order correction. The
 * result is within about 1 ulp of the true sin/cos of the given double in degrees; exact values come out
 * at multiples of 90° (sin 180° = 0, cos 90° = 0 exactly). The technique is common practice in
 * geodetic software.
 */
public final class DegreeTrig {
    /** π/180 rounded to double. */
    private static final double DEG_HI = Math.PI / 180.0;
    /** π/180 − DEG_HI, to double precision (π/180 = 0.017453292519943295769236907684886...). */
    private static final double DEG_LO = 2.9486522708701687e-19;
    /** 180/π rounded to double, and its low part (180/π = 57.295779513082320876798154814105...). */
    private static final double RAD_HI = 180.0 / Math.PI;
    private static final double RAD_LO = -1.9878495670576283e-15;

    // atan(k/64), k = 0..64, as double-double (hi + lo), for the table-based arc tangent below.
    private static final double[] ATAN_HI = {
        0.0, 0.015623728620476831, 0.031239833430268277, 0.046840712915969654, 0.06241880999595735,
        0.0779666338315423, 0.09347678115858947, 0.10894195698986579, 0.12435499454676144,
        0.13970887428916365, 0.15499674192394097, 0.1702119252854744, 0.18534794999569476,
        0.2003985538258785, 0.21535769969773805, 0.23021958727684372, 0.24497866312686414,
        0.2596296294082575, 0.2741674511196588, 0.2885873618940774, 0.3028848683749714, 0.31705575320914703,
        0.3310960767041321, 0.34500217720710513, 0.35877067027057225, 0.3723984466767542,
        0.38588266939807375, 0.39922076957525254, 0.4124104415973873, 0.42544963737004227,
        0.43833655985795783, 0.4510696559885235, 0.4636476090008061, 0.4760693303227612, 0.48833395105640554,
        0.5004408131472942, 0.5123894603107377, 0.5241796287829132, 0.5358112379604637, 0.5472843809874369,
        0.5585993153435624, 0.5697564534829784, 0.5807563535676704, 0.5915997103351114, 0.6022873461349642,
        0.6128202021652414, 0.6231993299340659, 0.6334258829691446, 0.6435011087932844, 0.6534263411807619,
        0.6632029927060933, 0.6728325475937632, 0.6823165548747481, 0.6916566218531999, 0.7008544078844502,
        0.7099116184635249, 0.7188299996216245, 0.7276113326265107, 0.7362574289814281, 0.7447701257160751,
        0.7531512809621944, 0.7614027698055784, 0.7695264804056583, 0.7775243103733478, 0.7853981633974483,
    };

    private static final double[] ATAN_LO = {
        0.0, -4.913600136566304e-19, -1.188442711587748e-18, -1.655677442254952e-19, -1.5490756308295046e-18,
        5.804551873143357e-18, -6.2844725995420954e-18, 6.8267122072409585e-18, -3.1253241424539383e-18,
        -2.9579864247315813e-18, 9.585415594114324e-18, -3.541164079802125e-18, 4.180692268843079e-18,
        3.1399542871844493e-18, 4.738160130078733e-19, 1.2313404529142703e-17, 1.0698755618734451e-17,
        1.9238754924615304e-17, 8.261353575163773e-18, -1.428369957377257e-17, -1.1010827903001369e-17,
        -1.893928924292642e-17, -7.952610375793799e-18, -2.2938804755578304e-17, -2.4623815582638635e-17,
        1.9612311504845653e-17, 2.378822732491941e-17, 2.246598105617042e-17, -1.587652227770689e-17,
        2.3315530741892885e-17, -2.494277030626541e-17, -2.2703795229420475e-17, 2.2698777452961687e-17,
        1.4654487332256713e-17, -1.1373236189329585e-17, -4.7181675085518756e-17, -2.5462781472855804e-17,
        5.520094119641666e-18, -4.0637956834825575e-18, 4.923709671396255e-17, -5.4556305485916264e-18,
        1.2255062085054184e-17, -1.441464378193067e-17, 4.920495453686772e-17, 2.950430737228402e-17,
        -3.1552061848586226e-17, 2.672403885140095e-17, -2.7290767436015276e-17, 1.5834785051444286e-17,
        3.5800634857340095e-17, -3.076054864429649e-17, -1.899315009714705e-17, 6.943223671560008e-18,
        -8.117151192285796e-18, -1.987626234335816e-17, -4.597166450584887e-17, -2.1478388444456983e-17,
        2.569325697391839e-18, 3.473937648299457e-17, 3.708315849135547e-17, -2.4256934659182068e-17,
        9.850030332752822e-18, -3.704991905602721e-17, -2.6676490951944502e-17, 3.061616997868383e-17,
    };


    private DegreeTrig() {
    }

    /**
     * Writes sin(d°) into {@code out[off]} and cos(d°) into {@code out[off + 1]}.
     *
     * @param degrees any finite angle in degrees
     */
    public static void sinCos(double degrees, double[] out, int off) {
        // Reduce to r in [-45, 45] and quadrant q: degrees = 90 q + r. For |degrees| ≤ 360 (every
        // validated coordinate) the subtraction is exact by Sterbenz's lemma; larger angles are first
        // reduced modulo 360, which is also exact.
        double r = Math.abs(degrees) <= 360.0 ? degrees : Math.IEEEremainder(degrees, 360.0);
        int q = (int) Math.rint(r * (1.0 / 90.0));
        r -= 90.0 * q;
        double hi = r * DEG_HI;
        double lo = Math.fma(r, DEG_HI, -hi) + r * DEG_LO;
        double s0 = Math.sin(hi);
        double c0 = Math.cos(hi);
        double s = s0 + lo * c0;
        double c = c0 - lo * s0;
        switch (q & 3) {
            case 0:
                out[off] = s;
                out[off + 1] = c;
                break;
            case 1:
                out[off] = c;
                out[off + 1] = -s;
                break;
            case 2:
                out[off] = -s;
                out[off + 1] = -c;
                break;
            default:
                out[off] = -c;
                out[off + 1] = s;
                break;
        }
        // Keep signed zeros tidy: sin(-0) = -0 is fine, but avoid -0 cosines at exact quadrant points.
        if (out[off + 1] == 0.0) {
            out[off + 1] = 0.0;
        }
    }

    /** sin(d°). */
    public static double sin(double degrees) {
        double[] sc = new double[2];
        sinCos(degrees, sc, 0);
        return sc[0];
    }

    /** cos(d°). */
    public static double cos(double degrees) {
        double[] sc = new double[2];
        sinCos(degrees, sc, 0);
        return sc[1];
    }

    /**
     * atan2(y, x) in degrees, in [−180°, 180°]; see {@link #atan2(double, double, double)}.
     */
    public static double atan2(double y, double x) {
        return atan2(y, x, 0.0);
    }

    /**
     * atan2(y, x) + c in degrees, where c is a small correction in radians, rounded once at the end.
     *
     * <p>The octant is folded so that the arc tangent is taken of a ratio in [0, 1], split as atan(k/64),
     * from a double-double table, plus the arc tangent of a reduced argument below 1/128 whose numerator
     * is formed exactly with {@link Math#fma} (Taylor series to the 9th power, first omitted term below
     * 1e-24); the radian result is converted with
     * 180/π carried in two doubles and the octant is unfolded in double-double. The only rounding of
     * consequence left is the final one: the result is within about 0.5 ulp (plus ~1e-19 rad). Exact results come out on the axes: atan2(0, −1) = 180, atan2(1, 0) = 90,
     * atan2(−1, 0) = −90. Signed zeros count as zeros; atan2(0, 0) = 0.
     */
    public static double atan2(double y, double x, double correctionRadians) {
        double ay = Math.abs(y);
        double ax = Math.abs(x);
        boolean swap = ay > ax;
        double num = swap ? ax : ay;
        double den = swap ? ay : ax;
        double hi;
        double lo;
        if (den == 0) {
            hi = 0;
            lo = 0;
        } else {
            // atan(num/den) = atan r0 + atan((num − r0 den)/(den + r0 num)), r0 = k/64 nearest num/den:
            // the second arc tangent has an argument below 1/128, so its own rounding (half an ulp of
            // that) is below 1e-19 rad and a short Taylor series replaces the library arc tangent. The
            // numerator is exact (one rounding of a small quantity, by fma).
            int k = (int) Math.rint(num / den * 64);
            double r0 = k * 0x1p-6;
            double arg = Math.fma(-r0, den, num) / Math.fma(r0, num, den);
            // Taylor series to the 9th power: for |arg| ≤ 1/128 the first omitted term is below 1e-24.
            double a2 = arg * arg;
            double atanArg = arg - arg * a2 * (1.0 / 3 - a2 * (1.0 / 5 - a2 * (1.0 / 7 - a2 * (1.0 / 9))));
            double t = ATAN_HI[k];
            double tl = ATAN_LO[k] + atanArg;
            hi = t * RAD_HI;
            lo = Math.fma(t, RAD_HI, -hi) + t * RAD_LO + tl * RAD_HI;
        }
        if (swap) { // 90 − (hi + lo), with the rounding of the subtraction kept
            double d = 90.0 - hi;
            lo = ((90.0 - d) - hi) - lo;
            hi = d;
        }
        if (x < 0) { // 180 − (hi + lo)
            double d = 180.0 - hi;
            lo = ((180.0 - d) - hi) - lo;
            hi = d;
        }
        if (y < 0) {
            hi = -hi;
            lo = -lo;
        }
        return hi + (lo + correctionRadians * RAD_HI);
    }

    /** Radians to degrees with the conversion factor 180/π carried in two doubles. */
    public static double toDegrees(double radians) {
        double hi = radians * RAD_HI;
        return hi + (Math.fma(radians, RAD_HI, -hi) + radians * RAD_LO);
    }

    /** Degrees to radians with the conversion factor π/180 carried in two doubles. */
    public static double toRadians(double degrees) {
        double hi = degrees * DEG_HI;
        return hi + (Math.fma(degrees, DEG_HI, -hi) + degrees * DEG_LO);
    }
}
