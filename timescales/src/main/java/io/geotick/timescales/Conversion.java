package io.geotick.timescales;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * The result of a conversion: a value and the warnings under which it holds (empty when exact and certain).
 *
 * @param value    the converted value, never null
 * @param warnings the caveats, in the order they arose; immutable, empty when none
 * @param <T> the value type
 */
public record Conversion<T>(T value, List<TimeWarning> warnings) {
    public Conversion {
        Objects.requireNonNull(value, "value");
        warnings = List.copyOf(warnings);
    }

    /** An exact, certain result. */
    public static <T> Conversion<T> exact(T value) {
        return new Conversion<>(value, List.of());
    }

    /** A result with the given warnings. */
    public static <T> Conversion<T> of(T value, List<TimeWarning> warnings) {
        return new Conversion<>(value, warnings);
    }

    /** True when there are no warnings. */
    public boolean isClean() {
        return warnings.isEmpty();
    }

    /** Maps the value, keeping the warnings. */
    public <U> Conversion<U> map(Function<? super T, ? extends U> f) {
        return new Conversion<>(f.apply(value), warnings);
    }

    /** Chains a further conversion; the warnings of both are kept (duplicates dropped). */
    public <U> Conversion<U> then(Function<? super T, Conversion<U>> f) {
        Conversion<U> next = f.apply(value);
        return new Conversion<>(next.value(), merge(warnings, next.warnings()));
    }

    /** This result with extra warnings appended (duplicates dropped). */
    public Conversion<T> withWarnings(List<TimeWarning> more) {
        return more.isEmpty() ? this : new Conversion<>(value, merge(warnings, more));
    }

    static List<TimeWarning> merge(List<TimeWarning> a, List<TimeWarning> b) {
        if (b.isEmpty()) {
            return a;
        }
        List<TimeWarning> out = new ArrayList<>(a);
        for (TimeWarning w : b) {
            if (!out.contains(w)) {
                out.add(w);
            }
        }
        return out;
    }
}
