/**
 * Optional SIMD kernels for the array (batch) conversions, through the JDK's incubating vector API
 * ({@code jdk.incubator.vector}).
 *
 * <p>They are used only when the JVM is started with {@code --add-modules jdk.incubator.vector}, the
 * platform offers vectors of at least four doubles, and the system property {@code geotick.simd} is not
 * {@code off}; otherwise every conversion runs its scalar code. {@link io.geotick.geodesy.simd.Simd} tells
 * which applies. A kernel takes a block of points at once and hands any block with an unusual point (on an
 * axis, in the equatorial plane, near the centre, invalid, or needing more than one Newton step) back to the
 * scalar code, so errors and special cases behave exactly as without SIMD.
 */
package io.geotick.geodesy.simd;
