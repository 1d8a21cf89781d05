/**
 * Line lists (vacuum rest wavelengths with their sources) and the line finder (detected lines with centre, width, flux, EW, S/N and errors).
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.api.lines;
