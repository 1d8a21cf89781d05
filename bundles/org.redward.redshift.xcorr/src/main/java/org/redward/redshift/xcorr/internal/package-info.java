/** Fourier cross-correlation estimator (internal). */
package org.redward.redshift.xcorr.internal;
