package org.redward.mock.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.redward.spectrum.ObjectClass;

/**
 * The table of real spectra with published redshifts that the accuracy benchmark measures too:
 * a folder with the spectra and {@code truth.tsv} (columns {@code file}, {@code class},
 * {@code z_published}, {@code z_source}...). The published values are used only as the reference
 * the measurements are compared with.
 *
 * <p>Tolerances (as the folder's README asks): |dz|/(1+z) &lt; 0.001 in general; for broad-line
 * quasars at least 300 km/s (narrow lines can sit a few hundred km/s from the published value);
 * for a file whose reference value comes from a hand-typed table rather than the file, 0.001 in z.
 */
record RealData(String file, ObjectClass objectClass, double zPublished, String source) {

    static List<RealData> read(Path folder) throws IOException {
        Path tsv = folder.resolve("truth.tsv");
        if (!Files.isRegularFile(tsv)) {
            throw new IOException(folder + ": no truth.tsv (a table of file, class, z_published) in the real-data folder");
        }
        List<String> lines = Files.readAllLines(tsv);
        String[] head = lines.get(0).split("\t", -1);
        int file = col(head, "file", tsv);
        int cls = col(head, "class", tsv);
        int z = col(head, "z_published", tsv);
        int src = indexOf(head, "z_source");
        List<RealData> out = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            if (l.isBlank()) {
                continue;
            }
            String[] f = l.split("\t", -1);
            String c = f[cls].replaceAll("\\(.*", "").trim();
            out.add(new RealData(f[file], ObjectClass.parse(c), Double.parseDouble(f[z]), src >= 0 ? f[src] : ""));
        }
        return out;
    }

    private static int col(String[] head, String name, Path tsv) throws IOException {
        int i = indexOf(head, name);
        if (i < 0) {
            throw new IOException(tsv + ": no column '" + name + "'");
        }
        return i;
    }

    private static int indexOf(String[] head, String name) {
        for (int i = 0; i < head.length; i++) {
            if (head[i].trim().equalsIgnoreCase(name)) {
                return i;
            }
        }
        return -1;
    }

    /** Largest accepted |dz|/(1+z). */
    double tolerance() {
        if (source.toLowerCase(java.util.Locale.ROOT).contains("not in fits")) {
            return 0.001 / (1 + zPublished);
        }
        if (objectClass == ObjectClass.QUASAR) {
            return Math.max(Scorecard.SUCCESS, 300.0 / Grid.C_KM_S);
        }
        return Scorecard.SUCCESS;
    }
}
