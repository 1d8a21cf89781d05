/**
 * Spectrum readers (sniff and stream many spectra per file), instrument profiles, spectrum and catalogue writers.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.api.formats;
