/**
 * Redshift estimators and their solutions (z, sigma_z, grade, class, ranked alternatives, score-versus-z curve, provenance).
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.api.redshift;
