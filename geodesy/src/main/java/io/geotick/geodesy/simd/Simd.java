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
    private static final boolean SWITCHED_OFF = "off".equalsIgnoreCase(System.getProperty(PROPERTY));
    /** Doubles per preferred vector, 0 without the module; read once. */
    private static final int LANES = lanesOrZero();
    private static final boolean ENABLED = MODULE_PRESENT && !SWITCHED_OFF && LANES >= 4;

    private Simd() {
    }

    /** Whether the array conversions use their SIMD kernels in this JVM. */
    public static boolean enabled() {
        return ENABLED;
    }

    /** A one-line description of the state, for logs and {@code --version}. */
    public static String status() {
        if (ENABLED) {
            return "SIMD kernels on (" + MODULE + ", " + LANES + " doubles per vector)";
        }
        if (!MODULE_PRESENT) {
            return "SIMD kernels off (start Java with --add-modules " + MODULE + " to use them)";
        }
        if (SWITCHED_OFF) {
            return "SIMD kernels off (-D" + PROPERTY + "=off)";
        }
        return "SIMD kernels off (vectors of fewer than 4 doubles on this platform)";
    }

    /**
     * The constructor of the kernel class {@code className}, found through the caller's {@code lookup} (so
     * that the class may be package-private) and taking one {@code argType}, with the class initialised; empty
     * when the kernels are off, or when the class cannot be linked or initialised in this JVM (the scalar code
     * then runs). Callers keep the handle in a static final field and build kernels with {@link #newKernel}.
     */
    public static Optional<MethodHandle> kernelConstructor(MethodHandles.Lookup lookup, String className,
            Class<?> argType) {
        if (!ENABLED) {
            return Optional.empty();
        }
        try {
            Class<?> type = lookup.findClass(className);
            lookup.ensureInitialized(type);
            return Optional.of(lookup.findConstructor(type, MethodType.methodType(void.class, argType)));
        } catch (ReflectiveOperationException | LinkageError e) {
            return Optional.empty(); // not usable here: the scalar code runs
        }
    }

    /** A new kernel from a constructor given by {@link #kernelConstructor}, for {@code arg}. */
    public static Object newKernel(MethodHandle constructor, Object arg) {
        try {
            return constructor.invoke(arg);
        } catch (RuntimeException | Error e) {
            throw e;
        } catch (Throwable e) {
            throw new IllegalStateException("cannot build the SIMD kernel " + constructor, e);
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
