/**
 * The product's chart builders on the one chart model (JFreeChart): spectra with their error band,
 * masked regions, rest-frame lines at a redshift, detected lines and sky; score-versus-z curves
 * with alternatives; histograms; scatter plots with error bars; export to PNG, SVG and PDF without
 * a display.
 *
 * <p>Builders are not thread-safe; a built {@link org.jfree.chart.JFreeChart} must be touched by one
 * thread at a time (in the workbench, the UI thread). Tick labels never depend on the default
 * locale. Wavelengths are vacuum Angstrom throughout.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.charts;
