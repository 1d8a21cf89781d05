package org.redward.mock.internal;

import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The truth about one mock fibre, as written to and read from {@code truth.csv}. Redshifts:
 * {@code z_cosmo} (Hubble flow), {@code z_bary} (what a barycentric-frame measurement should
 * give: Hubble flow and peculiar velocity), {@code z_topo} (what the spectrum itself shows at
 * the telescope), related by {@code 1 + z_bary = (1 + z_topo)(1 + v_bary/c)}. NaN where there is
 * no object. Immutable.
 */
public record TruthRow(String objectId, String file, int row, int fibre, Kind kind, double raDeg, double decDeg,
        double mjdMidUtc, double zCosmo, double vPecKmPerS, double zBary, double vBaryKmPerS, double zTopo,
        double snrMedian, double magAb, int cosmicHits, int cosmicUnflagged, Map<String, Double> parameters) {

    static final String HEADER = "obj_id,file,row,fibre,kind,class,ra_deg,dec_deg,mjd_mid_utc,z_cosmo,v_pec_km_s,"
            + "z_bary,v_bary_km_s,z_topo,snr_median,mag_ab,cosmic_hits,cosmic_unflagged,parameters";

    String toCsv() {
        StringBuilder p = new StringBuilder();
        for (Map.Entry<String, Double> e : parameters.entrySet()) {
            if (p.length() > 0) {
                p.append(';');
            }
            p.append(e.getKey()).append('=').append(num(e.getValue(), 6));
        }
        return String.join(",", objectId, file, Integer.toString(row), Integer.toString(fibre), kind.key(),
                kind.objectClass().key(), num(raDeg, 7), num(decDeg, 7), num(mjdMidUtc, 6), num(zCosmo, 8),
                num(vPecKmPerS, 3), num(zBary, 8), num(vBaryKmPerS, 4), num(zTopo, 8), num(snrMedian, 3),
                num(magAb, 3), Integer.toString(cosmicHits), Integer.toString(cosmicUnflagged), p.toString());
    }

    static TruthRow parse(String line) {
        String[] f = line.split(",", -1);
        if (f.length != 19) {
            throw new IllegalArgumentException("truth row has " + f.length + " fields, expected 19: " + line);
        }
        Map<String, Double> p = new TreeMap<>();
        if (!f[18].isEmpty()) {
            for (String kv : f[18].split(";")) {
                String[] a = kv.split("=", 2);
                p.put(a[0], dbl(a[1]));
            }
        }
        return new TruthRow(f[0], f[1], Integer.parseInt(f[2]), Integer.parseInt(f[3]), Kind.parse(f[4]), dbl(f[6]),
                dbl(f[7]), dbl(f[8]), dbl(f[9]), dbl(f[10]), dbl(f[11]), dbl(f[12]), dbl(f[13]), dbl(f[14]),
                dbl(f[15]), Integer.parseInt(f[16]), Integer.parseInt(f[17]), p);
    }

    private static String num(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    private static double dbl(String s) {
        return s.isEmpty() ? Double.NaN : Double.parseDouble(s);
    }
}
