package io.geotick.transforms.fit;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One parameter of a fitted model with its standard uncertainty.
 *
 * @param name the parameter's name ({@code a}, {@code tx}, {@code rz}, {@code scale} …)
 * @param unit its unit ({@code m}, {@code 1}, {@code arc-second}, {@code ppm}, {@code degree})
 * @param value the estimate
 * @param sigma the standard uncertainty √(σ₀²·Q), empty when the fit has no redundancy
 */
public record FitParameter(String name, String unit, double value, OptionalDouble sigma) {

    public FitParameter {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(sigma, "sigma");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("parameter " + name + " = " + value + " is not a finite number");
        }
        if (sigma.isPresent() && !(sigma.getAsDouble() >= 0 && Double.isFinite(sigma.getAsDouble()))) {
            throw new IllegalArgumentException("uncertainty of parameter " + name + " = " + sigma.getAsDouble()
                + " is not a finite non-negative number");
        }
    }
}
