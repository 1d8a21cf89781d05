package org.redward.cosmology.internal;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
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
 * m_nu = 0.06            # eV, comma-separated, up to three; 0 for all massless
 * sigma_h0 = 1.0
 * sigma_omega_m = 0.01
 * </pre>
 */
final class ParameterFile {

    static final Set<String> KEYS = Set.of("base", "name", "citation", "h0", "omega_m", "omega_lambda", "w0", "wa",
            "t_cmb", "n_eff", "m_nu", "sigma_h0", "sigma_omega_m");

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
            Map<String, java.util.function.ObjDoubleConsumer<CosmologyParameters.Builder>> setters = new TreeMap<>();
            setters.put("h0", (x, v) -> x.h0(v).sigmaH0(0));
            setters.put("omega_m", (x, v) -> x.omegaMatter(v).sigmaOmegaMatter(0));
            setters.put("omega_lambda", CosmologyParameters.Builder::omegaDarkEnergy);
            setters.put("w0", CosmologyParameters.Builder::w0);
            setters.put("wa", CosmologyParameters.Builder::wa);
            setters.put("t_cmb", CosmologyParameters.Builder::cmbTemperatureK);
            setters.put("n_eff", CosmologyParameters.Builder::effectiveNeutrinoSpecies);
            setters.put("sigma_h0", CosmologyParameters.Builder::sigmaH0);
            setters.put("sigma_omega_m", CosmologyParameters.Builder::sigmaOmegaMatter);
            // h0 and omega_m first: they reset the base's uncertainties, which sigma_* may then set.
            for (String key : List.of("h0", "omega_m", "omega_lambda", "w0", "wa", "t_cmb", "n_eff", "sigma_h0", "sigma_omega_m")) {
                if (kv.containsKey(key)) {
                    setters.get(key).accept(b, number(file, kv, key));
                }
            }
            if (kv.containsKey("m_nu")) {
                String[] parts = kv.get("m_nu").split(",");
                double[] m = new double[parts.length];
                for (int i = 0; i < parts.length; i++) {
                    try {
                        m[i] = Double.parseDouble(parts[i].trim());
                    } catch (NumberFormatException e) {
                        throw new UsageException("--config " + file + ": m_nu = '" + kv.get("m_nu") + "' is not a list of numbers");
                    }
                }
                b.neutrinoMassesEv(java.util.Arrays.stream(m).filter(x -> x != 0).toArray());
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
