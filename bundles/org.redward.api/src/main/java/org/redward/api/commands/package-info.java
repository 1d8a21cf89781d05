/**
 * Commands that bundles contribute to the command line, and the context they run in.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.api.commands;
