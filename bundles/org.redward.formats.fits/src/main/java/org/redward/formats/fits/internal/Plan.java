package org.redward.formats.fits.internal;

import org.redward.api.formats.SpectrumRecord;

/** How the spectra of one FITS file are read: a layout understood, and spectra by index. */
interface Plan {

    /** The layout understood, for the user. */
    String layout();

    /** Number of spectra. */
    int count();

    /** Reads spectrum {@code index}; a problem gives a failed record naming HDU and column. Never throws. */
    SpectrumRecord read(int index);
}
