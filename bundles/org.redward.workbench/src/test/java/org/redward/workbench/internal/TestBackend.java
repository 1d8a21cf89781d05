package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import org.redward.api.lines.FinderSettings;
import org.redward.api.redshift.ScoreCurve;
import org.redward.lines.internal.LineListFile;
import org.redward.lines.internal.MatchedFilterFinder;
import org.redward.charts.FoundLine;
import org.redward.charts.RestLine;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * A backend for tests without the OSGi platform. It reads the public SDSS "spec" layout of
 * ../shared/realdata (HDU 1 COADD: flux, loglam, ivar, and_mask, sky; see that folder's README)
 * and never reads the published answer (HDU 2, the model column). Its two "estimators" are
 * crude line-comb scorers written for these tests only: for each trial z they add up the
 * continuum-subtracted flux at the redshifted positions of strong emission lines (estimator
 * {@code comb-em}) or subtract it at absorption lines ({@code comb-abs}), and rank the peaks.
 */
class TestBackend implements Backend {

    volatile int loads;
    final List<Path> installed = new ArrayList<>();

    @Override
    public List<QueueItem> list(Path path) {
        QueueItem it = new QueueItem(path, 0, null);
        if (!Files.isRegularFile(path)) {
            it.problem(path + ": no such file");
        }
        return List.of(it);
    }

    @Override
    public Loaded load(QueueItem item) throws IOException {
        loads++;
        Path f = item.source();
        try (Fits fits = new Fits(f.toFile())) {
            BasicHDU<?> h = fits.getHDU(1);
            if (!(h instanceof BinaryTableHDU t)) {
                throw new IOException(f.getFileName() + ": HDU 1 is not a binary table");
            }
            float[] flux = (float[]) t.getColumn("flux");
            float[] loglam = (float[]) t.getColumn("loglam");
            float[] ivar = (float[]) t.getColumn("ivar");
            int[] andMask = (int[]) t.getColumn("and_mask");
            float[] sky = (float[]) t.getColumn("sky");
            int n = flux.length;
            double[] fl = new double[n];
            double[] iv = new double[n];
            double[] sk = new double[n];
            boolean[] m = new boolean[n];
            for (int i = 0; i < n; i++) {
                fl[i] = flux[i];
                iv[i] = ivar[i];
                sk[i] = sky[i];
                m[i] = ivar[i] <= 0 || andMask[i] != 0;
            }
            SpectralAxis axis = SpectralAxis.logLinear(loglam[0], 1e-4, n, Medium.VACUUM);
            String id = f.getFileName().toString().replace(".fits", "");
            Spectrum s = Spectrum.of(axis, fl, iv, m, "1e-17 erg/s/cm²/Å", SpectrumMetadata.builder().objectId(id).build());
            return new Loaded(s, sk, "SDSS spec (test reader)", findLines(s));
        } catch (RuntimeException e) {
            throw new IOException(f.getFileName() + ": not a readable FITS spectrum (" + e.getMessage() + ")");
        }
    }

    @Override
    public List<String> estimators() {
        return List.of("comb-em", "comb-abs");
    }

    @Override
    public MachineAnswer estimate(String id, Spectrum s) {
        boolean emission = id.equals("comb-em");
        double[] rest = emission ? new double[] {3728.48, 4862.683, 5008.240, 6564.614, 6585.27, 6718.29}
                : new double[] {3934.777, 3969.591, 5174.125, 5894.57};
        double[] wl = s.axis().vacuumAngstrom();
        double[] f = s.flux();
        boolean[] m = s.mask();
        double[] resid = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            // continuum: running median of 101 pixels (ignoring masked)
            List<Double> win = new ArrayList<>();
            for (int k = Math.max(0, i - 50); k <= Math.min(f.length - 1, i + 50); k += 5) {
                if (!m[k]) {
                    win.add(f[k]);
                }
            }
            win.sort(Double::compare);
            resid[i] = m[i] || win.isEmpty() ? 0 : f[i] - win.get(win.size() / 2);
        }
        int nz = 1500;
        double[] z = new double[nz];
        double[] score = new double[nz];
        for (int j = 0; j < nz; j++) {
            z[j] = -0.002 + j * 0.0002;
            double sum = 0;
            for (double r : rest) {
                double w = r * (1 + z[j]);
                int i = java.util.Arrays.binarySearch(wl, w);
                i = i < 0 ? -i - 1 : i;
                for (int k = i - 2; k <= i + 2; k++) {
                    if (k >= 0 && k < wl.length) {
                        sum += emission ? resid[k] : -resid[k];
                    }
                }
            }
            score[j] = sum;
        }
        List<Double> peaks = new ArrayList<>();
        boolean[] used = new boolean[nz];
        for (int p = 0; p < 3; p++) {
            int best = -1;
            for (int j = 0; j < nz; j++) {
                if (!used[j] && (best < 0 || score[j] > score[best])) {
                    best = j;
                }
            }
            peaks.add(z[best]);
            for (int j = Math.max(0, best - 25); j < Math.min(nz, best + 25); j++) {
                used[j] = true;
            }
        }
        return new MachineAnswer(id, true, "", peaks.get(0), 0.0002, "galaxy", emission ? "B" : "C", peaks,
                new ScoreCurve(z, score, emission ? "emission comb" : "absorption comb", false),
                emission ? List.of() : List.of("test scorer: absorption comb only"));
    }

    /** The product's standard line list (bundle org.redward.lines), read directly. */
    @Override
    public List<RestLine> lines() {
        return LineViews.restLines(LineListFile.standard());
    }

    /** The product's line finder (bundle org.redward.lines), called directly. */
    @Override
    public List<FoundLine> findLines(Spectrum spectrum) {
        return LineViews.found(new MatchedFilterFinder().find(spectrum, FinderSettings.defaults()));
    }

    @Override
    public List<String[]> velocitiesAndDistances(double z) {
        return Answers.velocityRows(z);
    }

    @Override
    public List<String[]> bundles() {
        List<String[]> out = new ArrayList<>();
        out.add(new String[] {"0", "test.system", "1.0.0", "active"});
        return out;
    }

    @Override
    public List<String[]> services() {
        List<String[]> out = new ArrayList<>();
        for (String e : estimators()) {
            out.add(new String[] {"estimators", e, "test"});
        }
        return out;
    }

    @Override
    public String install(Path jar) throws IOException {
        if (!jar.getFileName().toString().endsWith(".jar") || Files.size(jar) < 100) {
            throw new IOException(jar.getFileName() + " is not a bundle jar");
        }
        installed.add(jar);
        return "installed " + jar.getFileName();
    }

    @Override
    public String user() {
        return "tester";
    }
}
