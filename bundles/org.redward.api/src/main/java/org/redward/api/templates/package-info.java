/**
 * Template sets: id, version, checksum and rest-frame vacuum template spectra with their classes.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.api.templates;
