package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.util.FitsOutputStream;

/** The loader and the file layouts, on small invented files written by the test itself. */
class TemplateSetLoaderTest {

    private final Map<String, byte[]> files = new HashMap<>();

    private TemplateSetLoader.Loaded load(String descriptor) throws TemplateDataException {
        files.put("templates/set.properties", descriptor.getBytes(StandardCharsets.UTF_8));
        return TemplateSetLoader.load("bundle test.data 1.0.0", "templates/set.properties", files::get);
    }

    private static String text(double w0, double step, int n, java.util.function.IntToDoubleFunction flux) {
        StringBuilder sb = new StringBuilder("# invented test template\n# wavelength flux\n");
        for (int i = 0; i < n; i++) {
            sb.append(String.format(Locale.ROOT, "%.4f %s%n", w0 + i * step, Double.toString(flux.applyAsDouble(i))));
        }
        return sb.toString();
    }

    private void put(String name, String content) {
        files.put("templates/" + name, content.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void airWavelengthsBecomeVacuum() throws Exception {
        // Morton (2000) air -> vacuum pairs as tabulated in REFERENCES.md section 3 (computed): 6562.801 -> 6564.614
        put("a.txt", text(6562.801 - 50, 1.0, 101, i -> 1.0));
        TemplateSet s = load("id=t\ntemplates=a\nclass=galaxy\nmedium=air\ntemplate.a.file=a.txt\n").set();
        double[] w = s.templates().get(0).restVacuumAngstrom();
        assertEquals(6564.614, w[50], 0.01, "H-alpha air 6562.801 -> vacuum 6564.614 (Morton 2000; REFERENCES.md 3)");
        put("v.txt", text(6562.801 - 50, 1.0, 101, i -> 1.0));
        TemplateSet v = load("id=t\ntemplates=v\nclass=galaxy\nmedium=vacuum\ntemplate.v.file=v.txt\n").set();
        assertEquals(6562.801, v.templates().get(0).restVacuumAngstrom()[50], 1e-9, "vacuum files are kept as they are");
    }

    @Test
    void unitsAreConvertedToAngstrom() throws Exception {
        put("nm.txt", text(400, 0.1, 200, i -> 1.0 + i));
        TemplateSet s = load("id=t\ntemplates=n\nclass=star\nmedium=vacuum\nunit=nm\ntemplate.n.file=nm.txt\n").set();
        assertEquals(4000.0, s.templates().get(0).minRestVacuumAngstrom(), 1e-9);
    }

    @Test
    void implausibleUnitsAreRefused() {
        put("nm.txt", text(400, 0.1, 200, i -> 1.0));
        TemplateDataException e = assertThrows(TemplateDataException.class,
                () -> load("id=t\ntemplates=n\nclass=star\nmedium=vacuum\ntemplate.n.file=nm.txt\nunit=um\n"));
        assertTrue(e.getMessage().contains("nm.txt") && e.getMessage().contains("unit"), e.getMessage());
    }

    @Test
    void paddingIsTrimmedAndNoted() throws Exception {
        put("p.txt", text(3000, 5, 100, i -> i < 3 || i > 90 ? 0.0 : 2.0));
        TemplateSetLoader.Loaded l = load("id=t\ntemplates=p\nclass=galaxy\nmedium=vacuum\ntemplate.p.file=p.txt\n");
        Template t = l.set().templates().get(0);
        assertEquals(88, t.size());
        assertEquals(3015.0, t.minRestVacuumAngstrom(), 1e-9);
        assertTrue(l.notes().get(0).contains("trimmed 12 padding pixels"), l.notes().toString());
    }

    @Test
    void gapsAreRefusedNamingBundleAndFile() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < 100; i++) {
            double w = i < 50 ? 4000 + i : 4200 + i;
            sb.append(w).append(' ').append(1.0).append('\n');
        }
        put("gap.txt", sb.toString());
        TemplateDataException e = assertThrows(TemplateDataException.class,
                () -> load("id=t\ntemplates=g\nclass=galaxy\nmedium=vacuum\ntemplate.g.file=gap.txt\n"));
        assertTrue(e.getMessage().startsWith("bundle test.data 1.0.0"), e.getMessage());
        assertTrue(e.getMessage().contains("templates/gap.txt") && e.getMessage().contains("gap"), e.getMessage());
    }

    @Test
    void nanPixelsAreRefusedOrInterpolatedOnRequest() throws Exception {
        put("n.txt", text(4000, 1, 100, i -> i == 40 ? Double.NaN : 1.0 + 0.01 * i));
        TemplateDataException e = assertThrows(TemplateDataException.class,
                () -> load("id=t\ntemplates=n\nclass=quasar\nmedium=vacuum\ntemplate.n.file=n.txt\n"));
        assertTrue(e.getMessage().contains("1 bad pixels") && e.getMessage().contains("4040.00"), e.getMessage());
        TemplateSetLoader.Loaded l = load("id=t\ntemplates=n\nclass=quasar\nmedium=vacuum\nbad-pixels=interpolate\ntemplate.n.file=n.txt\n");
        assertEquals(1.40, l.set().templates().get(0).flux()[40], 1e-12);
    }

    @Test
    void zerosCanBeDeclaredBad() throws Exception {
        put("z.txt", text(4000, 1, 100, i -> i == 40 || i == 41 ? 0.0 : 3.0));
        TemplateSetLoader.Loaded l = load("id=t\ntemplates=z\nclass=quasar\nmedium=vacuum\nbad-pixels=interpolate\nzero-is-bad=true\ntemplate.z.file=z.txt\n");
        assertEquals(3.0, l.set().templates().get(0).flux()[41], 1e-12);
    }

    @Test
    void descriptorMistakesAreNamed() {
        put("a.txt", text(4000, 1, 100, i -> 1.0));
        assertTrue(assertThrows(TemplateDataException.class, () -> load("templates=a\nclass=galaxy\nmedium=air\ntemplate.a.file=a.txt\n"))
                .getMessage().contains("'id' is missing"));
        assertTrue(assertThrows(TemplateDataException.class, () -> load("id=t\ntemplates=a\nclass=nebula\nmedium=air\ntemplate.a.file=a.txt\n"))
                .getMessage().contains("class 'nebula'"));
        assertTrue(assertThrows(TemplateDataException.class, () -> load("id=t\ntemplates=a\nclass=galaxy\ntemplate.a.file=a.txt\n"))
                .getMessage().contains("'medium'"));
        assertTrue(assertThrows(TemplateDataException.class, () -> load("id=t\ntemplates=a\nclass=galaxy\nmedium=air\ntemplate.a.file=b.txt\n"))
                .getMessage().contains("templates/b.txt") );
        assertTrue(assertThrows(TemplateDataException.class, () -> load("id=bad id\ntemplates=a\nclass=galaxy\nmedium=air\ntemplate.a.file=a.txt\n"))
                .getMessage().contains("id 'bad id'"));
        put("junk.txt", "this is not a spectrum\nat all\n");
        assertTrue(assertThrows(TemplateDataException.class, () -> load("id=t\ntemplates=j\nclass=galaxy\nmedium=air\ntemplate.j.file=junk.txt\n"))
                .getMessage().contains("junk.txt"));
    }

    @Test
    void trustedRangeCrops() throws Exception {
        put("a.txt", text(4000, 1, 1000, i -> 1.0));
        Template t = load("id=t\ntemplates=a\nclass=galaxy\nmedium=vacuum\ntrust=4100-4500\ntemplate.a.file=a.txt\n").set().templates().get(0);
        assertEquals(4100.0, t.minRestVacuumAngstrom(), 1e-9);
        assertEquals(4500.0, t.maxRestVacuumAngstrom(), 1e-9);
    }

    @Test
    void fitsBinaryTablesAreRead() throws Exception {
        int n = 200;
        float[] w = new float[n];
        float[] f = new float[n];
        for (int i = 0; i < n; i++) {
            w[i] = 3000 + 5 * i;
            f[i] = 1 + i;
        }
        BinaryTable table = new BinaryTable();
        table.addColumn(w);
        table.addColumn(f);
        BinaryTableHDU hdu = BinaryTableHDU.wrap(table);
        hdu.setColumnName(0, "WAVELENGTH", null);
        hdu.setColumnName(1, "FLUX", null);
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (Fits fits = new Fits(); FitsOutputStream out = new FitsOutputStream(bos)) {
            fits.addHDU(Fits.makeHDU((Object) null));
            fits.addHDU(hdu);
            fits.write(out);
        }
        files.put("templates/t.fits", bos.toByteArray());
        TemplateSet s = load("id=t\ntemplates=x\nclass=star\nmedium=vacuum\ntemplate.x.file=t.fits\n").set();
        Template t = s.templates().get(0);
        assertEquals(n, t.size());
        assertEquals(3005.0, t.restVacuumAngstrom()[1], 1e-9);
        assertEquals(ObjectClass.STAR, t.objectClass());
        assertEquals(200.0, t.flux()[199], 1e-9);
    }

    @Test
    void checksumDependsOnDataNotOnIdOrVersion() throws Exception {
        put("a.txt", text(4000, 1, 100, i -> 1.0 + i));
        TemplateSet one = load("id=one\nversion=1.0.0\ntemplates=a\nclass=galaxy\nmedium=vacuum\ntemplate.a.file=a.txt\n").set();
        TemplateSet two = load("id=two\nversion=2.0.0\ntemplates=a\nclass=galaxy\nmedium=vacuum\ntemplate.a.file=a.txt\n").set();
        assertEquals(one.checksum(), two.checksum());
        TemplateSet air = load("id=one\ntemplates=a\nclass=galaxy\nmedium=air\ntemplate.a.file=a.txt\n").set();
        assertNotEquals(one.checksum(), air.checksum(), "converted wavelengths are different data");
        assertEquals(List.of("a"), one.templates().stream().map(Template::id).toList());
    }
}
