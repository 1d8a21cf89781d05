/**
 * Velocity conventions and frame corrections (barycentric, heliocentric, CMB, Local Group).
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package org.redward.api.frames;
