/**
 * The immutable spectrum model shared by every Redward bundle.
 *
 * <p>Wavelengths are held internally as <em>vacuum</em> wavelengths in Angstrom, whatever the
 * file said; the axis remembers the unit, medium and sampling it was read with so that tools can
 * report what they understood. Conversions happen at the edges (readers, writers, displays).
 *
 * <p>All types here are immutable and thread-safe.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.spectrum;
