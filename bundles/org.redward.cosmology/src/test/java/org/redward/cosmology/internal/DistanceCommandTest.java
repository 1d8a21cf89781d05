package org.redward.cosmology.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.registry.Provided;

/** The distance command without a framework: JSON keys of the contract, options, errors. */
class DistanceCommandTest {

    private final ByteArrayOutputStream bytes = new ByteArrayOutputStream();

    private DistanceCommand command() {
        DistanceCommand c = new DistanceCommand();
        c.calculator = new Calculator();
        c.sets = new CosmologyRegistry() {
            @Override
            public String family() {
                return FAMILY;
            }

            @Override
            public List<Provided<CosmologySet>> providers() {
                return List.of(set(new EinsteinDeSitterSet()), set(new Ladder2022Set()), set(new Planck2018Set()));
            }
        };
        return c;
    }

    private static Provided<CosmologySet> set(CosmologySet s) {
        return Provided.of(s.parameters().name(), s, "org.redward.cosmology", "0", "", Map.of());
    }

    private String run(String... args) throws Exception {
        bytes.reset();
        PrintStream out = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        CommandContext ctx = new CommandContext() {
            public PrintStream out() { return out; }
            public PrintStream err() { return out; }
            public Path workingDirectory() { return Path.of("."); }
            public Path productHome() { return Path.of("."); }
            public List<Path> dropInFolders() { return List.of(); }
            public boolean debug() { return false; }
            public boolean interactive() { return false; }
            public Progress progress(String label, long total) {
                return new Progress() {
                    public void advance(long items) { }
                    public void total(long t) { }
                    public void close() { }
                };
            }
        };
        assertEquals(0, command().run(ctx, List.of(args)));
        return bytes.toString(StandardCharsets.UTF_8);
    }

    @Test
    void jsonHasTheContractKeys() throws Exception {
        String out = run("0.5", "--json");
        for (String key : new String[] {"\"z\":", "\"comoving_mpc\":", "\"transverse_comoving_mpc\":", "\"angular_diameter_mpc\":",
                "\"luminosity_mpc\":", "\"distance_modulus_mag\":", "\"lookback_gyr\":", "\"age_gyr\":", "\"hubble_law_mpc\":"}) {
            assertTrue(out.contains(key), key + " missing in " + out);
        }
        assertTrue(out.contains("\"cosmology\":\"planck2018\""));
        assertTrue(out.contains("Hubble-law"), "the Hubble-law warning at z = 0.5");
    }

    @Test
    void customParametersAndCompare() throws Exception {
        // Row 9 of the reference table (astropy cosmo_flat.ecsv): flat, Omega_m = 0.3, h = 0.7: D_M(1) = 3303.8288 Mpc.
        String out = run("1", "--json", "--h0", "70", "--omega-m", "0.3", "--t-cmb", "0", "--compare-h0");
        assertTrue(out.contains("\"transverse_comoving_mpc\":3303.828"), out);
        assertTrue(out.contains("\"compare_h0\":[{\"h0_km_s_mpc\":67.66"), out);
        String text = run("1", "--compare-h0=70,75");
        assertTrue(text.contains("H0 compared"), text);
    }

    @Test
    void inverseOptions() throws Exception {
        String out = run("--at-comoving-mpc", "3303.8288", "--h0", "70", "--omega-m", "0.3", "--t-cmb", "0", "--json");
        assertTrue(out.startsWith("{\"z\":0.99999"), out);
    }

    @Test
    void configFile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("mine.properties");
        Files.writeString(f, "# a closed model\nbase = eds\nh0 = 70\nomega_m = 2\nomega_lambda = 0.1   # curvature follows\n");
        // Row 10 (astropy cosmo_closed.ecsv): D_M(1) = 2152.7954 Mpc.
        String out = run("1", "--json", "--config", f.toString());
        assertTrue(out.contains("\"transverse_comoving_mpc\":2152.795"), out);
        Files.writeString(f, "h0 = 70\nomega_mm = 2\n");
        UsageException e = assertThrows(UsageException.class, () -> run("1", "--config", f.toString()));
        assertTrue(e.getMessage().contains("omega_mm"), e.getMessage());
    }

    @Test
    void badInputNamesTheParameter() {
        assertTrue(assertThrows(UsageException.class, () -> run("-0.2")).getMessage().startsWith("z:"));
        assertTrue(assertThrows(UsageException.class, () -> run("nan")).getMessage().startsWith("z:"));
        assertTrue(assertThrows(UsageException.class, () -> run("1e5")).getMessage().startsWith("z:"));
        assertTrue(assertThrows(UsageException.class, () -> run("1", "--omega-m", "-0.3")).getMessage().startsWith("--omega-m"));
        assertTrue(assertThrows(UsageException.class, () -> run("1", "--h0", "0")).getMessage().startsWith("--h0"));
        assertTrue(assertThrows(UsageException.class, () -> run("1", "--omega-m", "0.3", "--omega-lambda", "2"))
                .getMessage().contains("no big bang"));
        assertTrue(assertThrows(UsageException.class, () -> run("1", "--cosmology", "nope")).getMessage().contains("planck2018"));
    }
}
