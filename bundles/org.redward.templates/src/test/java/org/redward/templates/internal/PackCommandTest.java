package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.commands.UsageException;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;

/** {@code templates pack}: options per file, a hand-written descriptor, and bad usage in one line. */
class PackCommandTest {

    @TempDir
    Path dir;

    private Path textTemplate(String name, double w0) throws Exception {
        StringBuilder sb = new StringBuilder("# invented test data\n");
        for (int i = 0; i < 300; i++) {
            sb.append(String.format(Locale.ROOT, "%.2f %.4f%n", w0 + 2 * i, 1 + 0.001 * i));
        }
        Path p = dir.resolve(name);
        Files.createDirectories(p.getParent());
        Files.writeString(p, sb.toString());
        return p;
    }

    private int run(TestContext ctx, String... args) throws Exception {
        return new TemplatesCommand().run(ctx, List.of(args));
    }

    @Test
    void optionsApplyOncePerFileOrToAll() throws Exception {
        Path a = textTemplate("a.txt", 4000);
        Path b = textTemplate("b.txt", 4000);
        TestContext ctx = new TestContext(dir);
        assertEquals(0, run(ctx, "pack", a.toString(), b.toString(), "--id", "two", "--class", "galaxy,star",
                "--subclass", "Sbc,K0V", "--medium", "vacuum", "--out", "out/two.jar", "--json"), ctx.stderr());
        assertTrue(ctx.stdout().contains("\"id\":\"two\"") && ctx.stdout().contains("\"galaxy\":1") && ctx.stdout().contains("\"star\":1"), ctx.stdout());
        TemplateSet s = TemplateSetLoader.loadJar(dir.resolve("out/two.jar")).get(0).set();
        assertEquals(ObjectClass.STAR, s.templates().get(1).objectClass());
        assertEquals("K0V", s.templates().get(1).subclass());
        UsageException e = assertThrows(UsageException.class, () -> run(new TestContext(dir), "pack", a.toString(), b.toString(),
                "--id", "x", "--class", "galaxy,star,quasar", "--medium", "air", "--out", "x.jar"));
        assertTrue(e.getMessage().contains("--class given 3 times for 2 files"), e.getMessage());
    }

    @Test
    void aHandWrittenDescriptorIsPackedWithItsFiles() throws Exception {
        textTemplate("set/galaxies/g.txt", 3000);
        textTemplate("set/stars/s.txt", 5000);
        Path d = dir.resolve("set/my.properties");
        Files.writeString(d, String.join("\n", "id = hand-made", "version = 2.1.0", "description = invented test set",
                "templates = g, s", "medium = vacuum", "template.g.file = galaxies/g.txt", "template.g.class = galaxy",
                "template.s.file = stars/s.txt", "template.s.class = star", "template.s.trust = 5100-5400", ""));
        TestContext ctx = new TestContext(dir);
        assertEquals(0, run(ctx, "pack", "--descriptor", d.toString(), "--out", "hand.jar"), ctx.stderr());
        TemplateSet s = TemplateSetLoader.loadJar(dir.resolve("hand.jar")).get(0).set();
        assertEquals("hand-made", s.id());
        assertEquals("2.1.0", s.version());
        assertEquals(5100.0, s.templates().get(1).minRestVacuumAngstrom(), 1e-9);
        assertThrows(UsageException.class, () -> run(new TestContext(dir), "pack", "--descriptor", d.toString(), "--class", "star", "--out", "x.jar"));
        Files.writeString(d, "id = bad\ntemplates = g\nmedium = vacuum\ntemplate.g.class = galaxy\ntemplate.g.file = ../g.txt\n");
        TestContext bad = new TestContext(dir);
        assertEquals(1, run(bad, "pack", "--descriptor", d.toString(), "--out", "bad.jar"));
        assertTrue(bad.stderr().contains("below the descriptor's folder"), bad.stderr());
        assertTrue(!Files.exists(dir.resolve("bad.jar")), "nothing is written for a refused set");
    }

    @Test
    void aSetTheExtenderWouldRefuseIsNotWritten() throws Exception {
        Path a = dir.resolve("nan.txt");
        Files.writeString(a, "4000 1\n4001 1\n4002 nan\n4003 1\n4004 1\n4005 1\n4006 1\n4007 1\n4008 1\n4009 1\n4010 1\n");
        TestContext ctx = new TestContext(dir);
        assertEquals(1, run(ctx, "pack", a.toString(), "--id", "n", "--class", "quasar", "--medium", "vacuum", "--out", "n.jar"));
        assertTrue(ctx.stderr().startsWith("redward templates pack: set n: template 'nan' (file templates/nan.txt): 1 bad pixels"), ctx.stderr());
        assertTrue(!Files.exists(dir.resolve("n.jar")));
        assertThrows(UsageException.class, () -> run(new TestContext(dir), "pack", a.toString(), "--id", "n", "--out", "n.jar"));
        assertThrows(UsageException.class, () -> run(new TestContext(dir), "frobnicate"));
    }
}
