package org.redward.cosmology.internal;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Properties;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Function;

import org.redward.api.commands.UsageException;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.InvalidCosmologyException;

/**
 * A cosmology described in a plain {@code key = value} file (java.util.Properties syntax, '#'
 * comments):
 *
 * <pre>
 * # optional: start from a named set, then change what follows
 * base = planck2018
 * name = my-set
 * citation = where the numbers come from
 * h0 = 70
 * omega_m = 0.3
 * omega_lambda = 0.7      # omit to keep the base's flatness
 * w0 = -1
 * wa = 0
 * t_cmb = 2.7255          # K; 0 means no radiation
 * n_eff = 3.046
 * sigma_h0 = 1.0
 * sigma_omega_m = 0.01
 * </pre>
 */
final class ParameterFile {

    static final Set<String> KEYS = Set.of("base", "name", "citation", "h0", "omega_m", "omega_lambda", "w0", "wa",
            "t_cmb", "n_eff", "sigma_h0", "sigma_omega_m");

    private ParameterFile() {
    }

    /**
     * Reads the file and applies it on top of a base set found by {@code sets}.
     *
     * @throws UsageException naming the file and key at fault
     */
    static CosmologyParameters read(Path file, Function<String, CosmologyParameters> sets, CosmologyParameters fallbackBase) {
        Properties props = new Properties();
        try (Reader r = Files.newBufferedReader(file)) {
            props.load(r);
        } catch (IOException e) {
            throw new UsageException("--config " + file + ": cannot read (" + e.getMessage() + ")");
        }
        Map<String, String> kv = new TreeMap<>();
        for (String k : props.stringPropertyNames()) {
            String key = k.trim().toLowerCase(java.util.Locale.ROOT);
            if (!KEYS.contains(key)) {
                throw new UsageException("--config " + file + ": unknown key '" + k + "' (known: " + String.join(", ", KEYS.stream().sorted().toList()) + ")");
            }
            kv.put(key, stripComment(props.getProperty(k)));
        }
        CosmologyParameters base = kv.containsKey("base") ? sets.apply(kv.get("base")) : fallbackBase;
        CosmologyParameters.Builder b = base.toBuilder().name(kv.getOrDefault("name", file.getFileName().toString()))
                .citation(kv.getOrDefault("citation", "read from " + file + " (based on " + base.name() + ")"));
        try {
            if (kv.containsKey("h0")) {
                b.h0(number(file, kv, "h0")).sigmaH0(0);
            }
            if (kv.containsKey("omega_m")) {
                b.omegaMatter(number(file, kv, "omega_m")).sigmaOmegaMatter(0);
            }
            if (kv.containsKey("omega_lambda")) {
                b.omegaDarkEnergy(number(file, kv, "omega_lambda"));
            }
            if (kv.containsKey("w0")) {
                b.w0(number(file, kv, "w0"));
            }
            if (kv.containsKey("wa")) {
                b.wa(number(file, kv, "wa"));
            }
            if (kv.containsKey("t_cmb")) {
                b.cmbTemperatureK(number(file, kv, "t_cmb"));
            }
            if (kv.containsKey("n_eff")) {
                b.effectiveNeutrinoSpecies(number(file, kv, "n_eff"));
            }
            if (kv.containsKey("sigma_h0")) {
                b.sigmaH0(number(file, kv, "sigma_h0"));
            }
            if (kv.containsKey("sigma_omega_m")) {
                b.sigmaOmegaMatter(number(file, kv, "sigma_omega_m"));
            }
            return b.build();
        } catch (InvalidCosmologyException e) {
            throw new UsageException("--config " + file + ": " + e.getMessage());
        }
    }

    private static String stripComment(String v) {
        int hash = v.indexOf('#');
        return (hash >= 0 ? v.substring(0, hash) : v).trim();
    }

    private static double number(Path file, Map<String, String> kv, String key) {
        String v = kv.get(key);
        try {
            return Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new UsageException("--config " + file + ": " + key + " = '" + v + "' is not a number");
        }
    }
}
