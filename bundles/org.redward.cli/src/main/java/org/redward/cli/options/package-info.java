/**
 * Support for commands that parse their options with picocli: one way to parse, answer
 * {@code --help} and report a bad option, so that every command behaves alike.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.cli.options;
