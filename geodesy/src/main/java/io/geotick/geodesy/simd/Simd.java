package io.geotick.geodesy.simd;

import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.util.Optional;

/**
 * Whether the optional SIMD kernels are in use in this JVM, and a way to load one.
 *
 * <p>Why optional: in Java 17 the vector API is an incubating module, which a program must ask for at start
 * ({@code java --add-modules jdk.incubator.vector …}; the JVM then prints a one-line warning that an
 * incubating module is in use). geotick's array conversions work the same without it, only slower; see the
 * README's performance table for the size of the difference.
 */
public final class Simd {
    /** The system property that turns the kernels off: {@code -Dgeotick.simd=off}. */
    public static final String PROPERTY = "geotick.simd";
    private static final String MODULE = "jdk.incubator.vector";
    private static final boolean MODULE_PRESENT = ModuleLayer.boot().findModule(MODULE).isPresent();
    private static final boolean ENABLED = MODULE_PRESENT && !"off".equalsIgnoreCase(System.getProperty(PROPERTY))
        && lanesOrZero() >= 4;

    private Simd() {
    }

    /** Whether the array conversions use their SIMD kernels in this JVM. */
    public static boolean enabled() {
        return ENABLED;
    }

    /** A one-line description of the state, for logs and {@code --version}. */
    public static String status() {
        if (ENABLED) {
            return "SIMD kernels on (" + MODULE + ", " + lanesOrZero() + " doubles per vector)";
        }
        if (!MODULE_PRESENT) {
            return "SIMD kernels off (start Java with --add-modules " + MODULE + " to use them)";
        }
        if ("off".equalsIgnoreCase(System.getProperty(PROPERTY))) {
            return "SIMD kernels off (-D" + PROPERTY + "=off)";
        }
        return "SIMD kernels off (vectors of fewer than 4 doubles on this platform)";
    }

    /**
     * Builds the kernel class {@code className}, found through the caller's {@code lookup} (so that it may be
     * package-private), with its constructor taking one {@code argType}, if the kernels are enabled; empty
     * when they are not, or when the class cannot be linked or built in this JVM (the scalar code then runs).
     */
    public static <T> Optional<T> load(MethodHandles.Lookup lookup, Class<T> kernelType, String className,
            Class<?> argType, Object arg) {
        if (!ENABLED) {
            return Optional.empty();
        }
        try {
            Class<?> type = lookup.findClass(className);
            MethodHandle constructor = lookup.findConstructor(type, MethodType.methodType(void.class, argType));
            return Optional.of(kernelType.cast(constructor.invoke(arg)));
        } catch (VirtualMachineError e) {
            throw e;
        } catch (Throwable e) { // a kernel that cannot be linked or built is not used; the scalar code runs
            return Optional.empty();
        }
    }

    /** The preferred number of double lanes, 0 without the module (read reflectively: it may be absent). */
    private static int lanesOrZero() {
        if (!MODULE_PRESENT) {
            return 0;
        }
        try {
            Class<?> vector = Class.forName("jdk.incubator.vector.DoubleVector");
            Object species = vector.getField("SPECIES_PREFERRED").get(null);
            return (Integer) Class.forName("jdk.incubator.vector.VectorSpecies").getMethod("length").invoke(species);
        } catch (ReflectiveOperationException | LinkageError | RuntimeException e) {
            return 0;
        }
    }
}
