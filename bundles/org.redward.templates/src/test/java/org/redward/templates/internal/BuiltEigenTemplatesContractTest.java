package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;
import org.redward.testkit.SharedData;
import org.redward.testkit.TemplateSetContractTest;

/**
 * {@code templates build} on real spectra: the SDSS galaxy spectra of ../shared/realdata (Sloan
 * Digital Sky Survey public data releases), de-redshifted with their published redshifts from
 * truth.tsv, which here play the part of the "known redshifts" that the command takes as input
 * (the command exists to turn spectra of known z into templates; nothing here estimates a
 * redshift). The eigen-templates are then run through the conformance kit, and the first
 * component, which follows the mean galaxy spectrum, must show H-alpha emission and Ca II K
 * absorption at their rest vacuum wavelengths (REFERENCES.md section 2) to within 1 and 2
 * Angstrom: closer than the 1.8 Angstrom air-vacuum difference at H-alpha, so the
 * de-redshifting and the vacuum handling are both checked.
 */
class BuiltEigenTemplatesContractTest extends TemplateSetContractTest {

    private static Path jar;
    private static String output;

    static synchronized Path jar() throws Exception {
        if (jar == null) {
            Path real = SharedData.realData();
            Path dir = Files.createTempDirectory("redward-built-");
            List<String> rows = new ArrayList<>(List.of("# file z class (published values, used as known input)", "file z class"));
            List<String> args = new ArrayList<>();
            List<String> lines = Files.readAllLines(real.resolve("truth.tsv"));
            for (String l : lines.subList(1, lines.size())) {
                String[] p = l.split("\t");
                if (p[1].startsWith("SDSS") && p[3].equals("GALAXY")) {
                    rows.add(p[0] + " " + p[5] + " galaxy");
                    args.add(real.resolve(p[0]).toString());
                }
            }
            Path table = dir.resolve("known.txt");
            Files.write(table, rows);
            Path out = dir.resolve("built.jar");
            args.addAll(List.of("--redshifts", table.toString(), "--id", "built-sdss-galaxies", "--components", "3", "--out", out.toString()));
            TestContext ctx = new TestContext(dir);
            int rc = TemplateBuildCommand.run(ctx, args, new CoaddTestReaders());
            assertEquals(0, rc, ctx.stderr());
            output = ctx.stdout();
            jar = out;
        }
        return jar;
    }

    @Override
    protected TemplateSet createTemplateSet() throws Exception {
        return TemplateSetLoader.loadJar(jar()).get(0).set();
    }

    @Override
    protected List<ExpectedFeature> expectedFeatures() {
        return List.of(
                new ExpectedFeature(ObjectClass.GALAXY, "eigen-1", "H-alpha", 6564.614, true, 8, 1.0, "REFERENCES.md 2"),
                new ExpectedFeature(ObjectClass.GALAXY, "eigen-1", "Ca II K", 3934.777, false, 8, 2.0, "REFERENCES.md 2"));
    }

    @Test
    void buildReportsWhatItMade() throws Exception {
        jar();
        System.out.println(output);
        assertTrue(output.contains("3 templates (3 galaxy)"), output);
        assertTrue(output.toLowerCase(Locale.ROOT).contains("class galaxy: 8 spectra"), output);
    }
}
