/**
 * Cosmological parameter sets and the distance and time calculator.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.api.cosmology;
