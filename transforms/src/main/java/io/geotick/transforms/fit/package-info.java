/**
 * Control-point fits for site grids: a 2D similarity (4 parameters), 2D affine (6) or 3D Helmert (7,
 * rigorous rotation) estimated by least squares with Hipparchus from matched source / site-grid
 * coordinates, with parameter uncertainties, residuals, outlier flags, and a JSON model file.
 *
 * <p>Entry points: {@link io.geotick.transforms.fit.SiteFitter} (fit), {@link io.geotick.transforms.fit.SiteFit}
 * (result, refit without outliers), {@link io.geotick.transforms.fit.SiteModel} (the fitted, immutable
 * transform; {@code toJson} / {@code read}), {@link io.geotick.transforms.fit.SiteModelFormatException}
 * (invalid model file).
 */
package io.geotick.transforms.fit;
