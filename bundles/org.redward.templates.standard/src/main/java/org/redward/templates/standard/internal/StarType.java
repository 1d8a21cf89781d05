package org.redward.templates.standard.internal;

import java.util.List;

/**
 * A stellar spectral type of the standard set: effective temperature (dwarf scale, e.g. Pecaut &
 * Mamajek 2013; memory) and rest equivalent widths (Angstrom) of its main features. The widths
 * follow the well-known trends along the sequence (Balmer lines peak at A0 and fade to M; Ca II K,
 * the G band, Mg b and Na D grow towards K and M; TiO bands appear at late K and deepen through M;
 * common practice, e.g. Gray & Corbally 2009), with magnitudes from memory.
 */
record StarType(String name, double teffKelvin, double balmerEw, double balmerSigma, double caKEw, double gBandEw,
        double mgbEw, double naDEw, double caIEw, double caTripletEw, double tioDepth) {

    static final List<StarType> TYPES = List.of(
            new StarType("A0", 9600, 14, 16, 0.6, 0, 0.1, 0.1, 0, 0.3, 0),
            new StarType("A5", 8200, 12, 14, 2, 0, 0.2, 0.2, 0, 0.5, 0),
            new StarType("F0", 7300, 8, 10, 5, 0.5, 0.4, 0.4, 0.3, 1.0, 0),
            new StarType("F5", 6500, 5, 7, 8, 2, 0.7, 0.6, 0.5, 1.5, 0),
            new StarType("G0", 5900, 3.5, 5, 12, 5, 1.0, 0.9, 1.0, 2.0, 0),
            new StarType("G5", 5600, 2.7, 4, 14, 7, 1.3, 1.1, 1.3, 2.2, 0),
            new StarType("K0", 5200, 1.8, 3, 17, 8, 1.8, 1.6, 2.0, 2.5, 0),
            new StarType("K5", 4400, 1.0, 3, 19, 7, 2.6, 3.0, 3.5, 2.5, 0.08),
            new StarType("M0", 3850, 0.6, 3, 17, 5, 2.8, 4.0, 4.5, 2.3, 0.3),
            new StarType("M3", 3400, 0.4, 3, 14, 4, 2.5, 5.0, 5.0, 2.0, 0.55),
            new StarType("M5", 3100, 0.3, 3, 11, 3, 2.0, 6.0, 5.0, 1.7, 0.75));
}
