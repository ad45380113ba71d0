package io.geotick.transforms.helmert;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.EcefVelocity;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import java.util.Objects;

/**
 * The 14-parameter time-dependent Helmert transformation (EPSG methods 1053 position vector, 1056
 * coordinate frame; IOGP Guidance Note 7-2, §4.3.5): the seven parameters at the coordinate epoch t are
 * P(t) = P(t₀) + Ṗ·(t − t₀), then the 7-parameter formula (small-angle, as EPSG and the IERS define it) is
 * applied. Immutable and thread-safe.
 *
 * <p>The coordinate epoch is always required: there is no default. Units: P in m, ″, ppm; Ṗ in m/yr, ″/yr,
 * ppm/yr (see {@link HelmertParameters#ofMillimetres} for the mm, mas, ppb of the IERS tables).
 */
public final class TimeDependentHelmert {
    private final HelmertParameters atReference;
    private final HelmertParameters rates;
    private final Epoch referenceEpoch;
    private final RotationConvention convention;

    private TimeDependentHelmert(HelmertParameters p, HelmertParameters r, Epoch t0, RotationConvention c) {
        this.atReference = Objects.requireNonNull(p, "parameters");
        this.rates = Objects.requireNonNull(r, "rates");
        this.referenceEpoch = Objects.requireNonNull(t0, "reference epoch");
        this.convention = Objects.requireNonNull(c, "convention");
    }

    /**
     * A time-dependent Helmert transformation.
     *
     * @param atReference the seven parameters at the reference epoch (m, ″, ppm)
     * @param rates their rates (m/yr, ″/yr, ppm/yr)
     * @param referenceEpoch t₀
     * @param convention rotation convention of both parameters and rates
     */
    public static TimeDependentHelmert of(HelmertParameters atReference, HelmertParameters rates,
            Epoch referenceEpoch, RotationConvention convention) {
        return new TimeDependentHelmert(atReference, rates, referenceEpoch, convention);
    }

    /** Parameters at the reference epoch. */
    public HelmertParameters parametersAtReference() {
        return atReference;
    }

    /** Rates per year. */
    public HelmertParameters rates() {
        return rates;
    }

    /** The reference epoch t₀. */
    public Epoch referenceEpoch() {
        return referenceEpoch;
    }

    /** The rotation convention. */
    public RotationConvention convention() {
        return convention;
    }

    /** EPSG method code: 1053 (position vector) or 1056 (coordinate frame). */
    public int epsgMethod() {
        return convention.epsgTimeDependentMethod();
    }

    /** The seven parameters evaluated at the coordinate epoch t: P(t₀) + Ṗ·(t − t₀). */
    public HelmertParameters parametersAt(Epoch coordinateEpoch) {
        return atReference.plus(rates, require(coordinateEpoch).yearsSince(referenceEpoch));
    }

    /** The 7-parameter transformation valid for coordinates at that epoch. */
    public Helmert at(Epoch coordinateEpoch) {
        return Helmert.of(parametersAt(coordinateEpoch), convention, RotationForm.SMALL_ANGLE);
    }

    /** Transforms a position given at {@code coordinateEpoch}; the result is at the same epoch. */
    public EcefPosition apply(EcefPosition source, Epoch coordinateEpoch) {
        return at(coordinateEpoch).apply(source);
    }

    /**
     * Transforms a station velocity: the time derivative of X_T = X + D(t)·X + T(t), i.e.
     * V_T = V + D(t)·V + Ḋ·X + Ṫ (IERS Conventions 2010, §4.2.3, which drops the D·V term, below
     * 1e-9·|V|; it is kept here).
     */
    public EcefVelocity applyToVelocity(EcefPosition source, EcefVelocity velocity, Epoch coordinateEpoch) {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(velocity, "velocity");
        double[][] d = at(coordinateEpoch).matrix();
        Helmert rate = Helmert.of(rates, convention, RotationForm.SMALL_ANGLE);
        double[][] dr = rate.matrix();
        double[] x = {source.x(), source.y(), source.z()};
        double[] v = {velocity.vx(), velocity.vy(), velocity.vz()};
        double[] t = {rates.tx(), rates.ty(), rates.tz()};
        double[] out = new double[3];
        for (int i = 0; i < 3; i++) {
            // d is M·R (= I + D); dr is I + Ḋ for the rates read as a Helmert set.
            double s = 0;
            for (int j = 0; j < 3; j++) {
                s += d[i][j] * v[j] + (dr[i][j] - (i == j ? 1 : 0)) * x[j];
            }
            out[i] = s + t[i];
        }
        if (!Double.isFinite(out[0] + out[1] + out[2])) {
            throw new InvalidCoordinateException("velocity transformation produced a non-finite result");
        }
        return new EcefVelocity(out[0], out[1], out[2]);
    }

    /**
     * The EPSG reverse: all fourteen parameters negated, same reference epoch and convention. Like the
     * 7-parameter sign reversal it is exact to first order only; for ITRF-sized parameters (mm, ppb) the
     * difference from the exact inverse ({@code at(t).inverse()}) is below 1e-9 m, for 14-parameter sets
     * with decimetre translations and 30 mas rotations (e.g. ITRF2008 → GDA94) about 1e-7 m.
     */
    public TimeDependentHelmert reversedBySignReversal() {
        return new TimeDependentHelmert(atReference.negated(), rates.negated(), referenceEpoch, convention);
    }

    private Epoch require(Epoch e) {
        if (e == null) {
            throw new MissingEpochException("the time-dependent Helmert transformation (EPSG method "
                + epsgMethod() + ", reference epoch " + referenceEpoch + ") needs the coordinate epoch");
        }
        return e;
    }

    @Override
    public String toString() {
        return "Time-dependent " + convention.methodName() + " (EPSG method " + epsgMethod() + "), t0 = "
            + referenceEpoch + ", P = " + atReference + ", rates = " + rates;
    }
}
