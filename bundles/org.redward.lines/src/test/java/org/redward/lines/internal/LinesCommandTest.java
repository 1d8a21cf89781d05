package org.redward.lines.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.registry.Provided;

/**
 * The lines command end to end (without a framework): a test reading facade over the real SDSS spectrum
 * spec-0266-51630-0168 (SDSS public data release; published z 0.06740563 in truth.tsv).
 */
class LinesCommandTest {

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private LinesCommand command() {
        LinesCommand c = new LinesCommand();
        c.inputs = new SpectrumInputs() {
            @Override
            public Stream open(List<Path> inputs, ReadOptions options) {
                Iterator<Path> it = inputs.iterator();
                return new Stream() {
                    int done;

                    @Override public boolean hasNext() { return it.hasNext(); }
                    @Override public SpectrumRecord next() {
                        Path file = it.next();
                        done++;
                        if (!Files.isRegularFile(file)) {
                            return SpectrumRecord.failed(file, -1, "", file + ": no such file");
                        }
                        try {
                            return SpectrumRecord.ok(file, 0, "HDU 1", RealSpectra.read(file.getFileName().toString()));
                        } catch (Exception e) {
                            return SpectrumRecord.failed(file, 0, "HDU 1", e.toString());
                        }
                    }
                    @Override public int filesDone() { return done; }
                    @Override public int files() { return inputs.size(); }
                    @Override public void close() { }
                };
            }

            @Override
            public List<Path> expand(List<Path> inputs) {
                return inputs;
            }
        };
        c.lists = new Lists(List.of(Provided.of("standard", LineListFile.standard(), "test", "0", "", Map.of())));
        c.profiles = new Profiles(List.of());
        return c;
    }

    record Lists(List<Provided<LineList>> providers) implements LineListRegistry {
        @Override public String family() { return FAMILY; }
    }

    record Profiles(List<Provided<InstrumentProfile>> providers) implements ProfileRegistry {
        @Override public String family() { return FAMILY; }
    }

    private CommandContext ctx() {
        PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
        PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8);
        return new CommandContext() {
            @Override public PrintStream out() { return o; }
            @Override public PrintStream err() { return e; }
            @Override public Path workingDirectory() { return Path.of("."); }
            @Override public Path productHome() { return Path.of("."); }
            @Override public List<Path> dropInFolders() { return List.of(); }
            @Override public boolean debug() { return false; }
            @Override public boolean interactive() { return false; }
            @Override public Progress progress(String label, long total) {
                return new Progress() {
                    @Override public void advance(long items) { }
                    @Override public void total(long t) { }
                    @Override public void close() { }
                };
            }
        };
    }

    @Test
    void jsonLinesCarryTheContractKeys() throws Exception {
        String file = RealSpectra.file("spec-0266-51630-0168.fits").toString();
        assertEquals(0, command().run(ctx(), List.of(file, "--json")));
        String[] rows = out.toString(StandardCharsets.UTF_8).strip().split("\n");
        assertTrue(rows.length >= 10, "one object per detected line: " + rows.length);
        for (String key : List.of("\"observed_wavelength_angstrom\":", "\"snr\":", "\"fwhm_km_s\":", "\"equivalent_width_angstrom\":",
                "\"line\":", "\"rest_wavelength_angstrom\":", "\"z\":")) {
            assertTrue(rows[0].contains(key), key + " missing in " + rows[0]);
        }
        String ha = java.util.Arrays.stream(rows).filter(r -> r.contains("\"line\":\"H-alpha\"")).findFirst().orElseThrow();
        assertTrue(ha.contains("\"observed_wavelength_angstrom\":700"), ha);
    }

    @Test
    void textShowsTheAdoptedRedshift() throws Exception {
        String file = RealSpectra.file("spec-0266-51630-0168.fits").toString();
        assertEquals(0, command().run(ctx(), List.of(file, "--z", "0.0674")));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("given z = 0.067400"), text);
        assertTrue(text.contains("H-alpha"), text);
        out.reset();
        assertEquals(0, command().run(ctx(), List.of(file)));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("adopted z = 0.0673"), out.toString(StandardCharsets.UTF_8));
    }

    @Test
    void badUsageIsOneClearLine() {
        UsageException e = assertThrows(UsageException.class, () -> command().run(ctx(), List.of("x.fits", "--mask", "5000")));
        assertTrue(e.getMessage().startsWith("--mask:"), e.getMessage());
        UsageException l = assertThrows(UsageException.class, () -> command().run(ctx(), List.of("x.fits", "--list", "nope")));
        assertTrue(l.getMessage().contains("available: standard"), l.getMessage());
    }

    @Test
    void missingFileIsReportedNotThrown() throws Exception {
        assertEquals(1, command().run(ctx(), List.of("/nonexistent/a.fits")));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("no such file"), err.toString(StandardCharsets.UTF_8));
    }

}
