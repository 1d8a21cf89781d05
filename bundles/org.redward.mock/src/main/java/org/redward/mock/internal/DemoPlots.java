package org.redward.mock.internal;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.redward.charts.ChartExport;
import org.redward.charts.HistogramChart;
import org.redward.charts.ScatterChart;
import org.redward.spectrum.ObjectClass;

/**
 * The demo's plots through the charts bundle: redshift distribution by class, the Hubble diagram
 * (luminosity distance against CMB-frame z, with the planck2018 curve and the Hubble law), and
 * measured against true redshift. Only loaded when the charts bundle is installed (its package
 * is an optional import).
 */
final class DemoPlots {

    private DemoPlots() {
    }

    /** Writes the PNG files into {@code folder}; returns their names. */
    static List<String> write(Path folder, List<Row> rows, java.util.function.DoubleUnaryOperator luminosityMpc,
            double hubbleDistanceMpc) throws java.io.IOException {
        List<String> files = new ArrayList<>();
        HistogramChart h = HistogramChart.create().title("Measured redshifts by class (invented Ember survey)")
                .xLabel("z (CMB frame where available)").bins(40, 0, 4.0);
        for (ObjectClass c : List.of(ObjectClass.GALAXY, ObjectClass.QUASAR, ObjectClass.STAR)) {
            double[] z = rows.stream().filter(r -> r.measured && r.objectClass == c)
                    .mapToDouble(r -> Double.isFinite(r.zCmb) ? r.zCmb : r.z).toArray();
            if (z.length > 0) {
                h.sample(String.format(Locale.ROOT, "%s (%d)", c.key(), z.length), z);
            }
        }
        save(h.build(), folder.resolve("redshift-distribution.png"), files);

        double[] zx = rows.stream().filter(r -> Double.isFinite(r.luminosityMpc) && r.luminosityMpc > 0).mapToDouble(r -> r.zCmb).toArray();
        double[] dl = rows.stream().filter(r -> Double.isFinite(r.luminosityMpc) && r.luminosityMpc > 0).mapToDouble(r -> r.luminosityMpc).toArray();
        if (zx.length > 0 && luminosityMpc != null) {
            double zmax = java.util.Arrays.stream(zx).max().orElse(1) * 1.1;
            ScatterChart s = ScatterChart.create().title("Hubble diagram of the demo objects (planck2018)")
                    .axes("z (CMB frame)", "luminosity distance (Mpc)")
                    .points("galaxies and quasars", zx, dl, null, null)
                    .curve("planck2018 D_L(z)", luminosityMpc, 0.005, zmax)
                    .curve("Hubble law c z / H0 (low z only)", z -> hubbleDistanceMpc * z, 0.005, zmax)
                    .logAxes(true, true);
            save(s.build(), folder.resolve("hubble-diagram.png"), files);
        }
        List<Row> scored = rows.stream().filter(r -> r.measured && r.truth != null && r.truth.kind().hasRedshift()).toList();
        if (!scored.isEmpty()) {
            double[] zt = scored.stream().mapToDouble(r -> r.truth.zTopo()).toArray();
            double[] zm = scored.stream().mapToDouble(r -> r.z).toArray();
            ScatterChart m = ScatterChart.create().title("Measured against true redshift (invented survey)")
                    .axes("true z", "measured z").points("fibres", zt, zm, null, null).identityLine(true);
            save(m.build(), folder.resolve("measured-vs-true.png"), files);
        }
        return files;
    }

    private static void save(JFreeChart chart, Path file, List<String> files) throws java.io.IOException {
        ChartExport.write(chart, file, 1000, 650);
        files.add(file.getFileName().toString());
    }
}
