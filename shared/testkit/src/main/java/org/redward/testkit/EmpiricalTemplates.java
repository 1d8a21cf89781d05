package org.redward.testkit;

import java.io.IOException;
import java.lang.reflect.Array;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;

import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.AirVacuum;
import org.redward.spectrum.ObjectClass;

/**
 * The published empirical templates of {@code ../shared/templates} as a {@link TemplateSet}, read
 * in test code: galaxies (Kinney et al. 1996, ApJ 467, 38; Calzetti, Kinney & Storchi-Bergmann
 * 1994, ApJ 429, 582), stars (Pickles 1998, PASP 110, 863) and the quasar composite (Vanden Berk
 * et al. 2001, AJ 122, 549). The 5 A grids do not state air or vacuum; as that folder's README
 * says, they are treated as air (converted to vacuum above 2,000 A). Never copied into the
 * repository.
 */
public final class EmpiricalTemplates {

    private EmpiricalTemplates() {
    }

    public static TemplateSet load() {
        Path dir = SharedData.templates();
        List<Template> out = new ArrayList<>();
        try {
            for (String folder : List.of("galaxies", "stars")) {
                ObjectClass c = folder.equals("stars") ? ObjectClass.STAR : ObjectClass.GALAXY;
                try (Stream<Path> files = Files.list(dir.resolve(folder))) {
                    for (Path f : files.filter(p -> p.toString().endsWith(".fits")).sorted().toList()) {
                        String name = f.getFileName().toString().replace(".fits", "");
                        out.add(readTable(f, name, c));
                    }
                }
            }
            out.add(readText(dir.resolve("quasars/VandenBerk2001.dat"), "vandenberk2001", ObjectClass.QUASAR));
        } catch (IOException | FitsException e) {
            throw new IllegalStateException("cannot read the empirical templates in " + dir + ": " + e, e);
        }
        return new SimpleTemplateSet("empirical", out);
    }

    private static Template readTable(Path file, String name, ObjectClass c) throws IOException, FitsException {
        try (Fits fits = new Fits(file.toFile())) {
            BasicHDU<?>[] hdus = fits.read();
            BinaryTableHDU t = (BinaryTableHDU) hdus[1];
            double[] w = doubles(t.getColumn("WAVELENGTH"));
            double[] f = doubles(t.getColumn("FLUX"));
            return make(c.key() + "-" + name, c, name, w, f, true);
        }
    }

    private static Template readText(Path file, String name, ObjectClass c) throws IOException {
        List<double[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(file)) {
            String s = line.trim();
            if (s.isEmpty() || s.startsWith("#")) {
                continue;
            }
            String[] p = s.split("\\s+");
            rows.add(new double[] {Double.parseDouble(p[0]), Double.parseDouble(p[1])});
        }
        double[] w = new double[rows.size()];
        double[] f = new double[rows.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = rows.get(i)[0];
            f[i] = rows.get(i)[1];
        }
        return make(c.key() + "-" + name, c, name, w, f, false);
    }

    private static Template make(String id, ObjectClass c, String sub, double[] w, double[] f, boolean air) {
        List<double[]> keep = new ArrayList<>();
        double last = 0;
        for (int i = 0; i < w.length; i++) {
            double v = air && w[i] >= AirVacuum.LOWER_LIMIT_ANGSTROM ? AirVacuum.airToVacuumAngstrom(w[i]) : w[i];
            if (Double.isFinite(v) && Double.isFinite(f[i]) && v > last) {
                keep.add(new double[] {v, f[i]});
                last = v;
            }
        }
        double[] ww = new double[keep.size()];
        double[] ff = new double[keep.size()];
        for (int i = 0; i < ww.length; i++) {
            ww[i] = keep.get(i)[0];
            ff[i] = keep.get(i)[1];
        }
        return Template.of(id.toLowerCase(Locale.ROOT), c, sub, ww, ff);
    }

    private static double[] doubles(Object a) {
        int n = Array.getLength(a);
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = ((Number) Array.get(a, i)).doubleValue();
        }
        return d;
    }
}
