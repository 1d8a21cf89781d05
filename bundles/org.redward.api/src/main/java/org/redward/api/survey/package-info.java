/**
 * Survey runs: measure many spectra into a catalogue (journalled, resumable, with a time bound
 * per spectrum and isolation of misbehaving plug-ins), for commands and for other bundles
 * (the demo, the workbench) alike.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.2.0")
package org.redward.api.survey;
