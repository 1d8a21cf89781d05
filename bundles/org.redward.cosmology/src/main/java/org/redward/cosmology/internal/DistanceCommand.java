package org.redward.cosmology.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.UsageException;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.cosmology.DistanceUncertainty;
import org.redward.api.cosmology.Distances;
import org.redward.api.cosmology.InvalidCosmologyException;
import org.redward.api.cosmology.Quantity;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrection;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.frames.FrameRequest;
import org.redward.api.frames.FrameStep;
import org.redward.api.frames.SolarMotion;
import org.redward.api.frames.VelocityConvention;
import org.redward.api.registry.Provided;
import org.redward.spectrum.SpectrumMetadata;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code redward distance Z...}: every cosmological distance and time for each redshift. */
@Component(property = {Command.NAME + "=distance", Command.SUMMARY + "=every cosmological distance and time for z"})
public final class DistanceCommand implements Command {

    @Reference
    CosmologyRegistry sets;

    @Reference
    CosmologyCalculator calculator;

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    volatile FrameCorrector frames;

    @CommandLine.Command(name = "distance", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Every cosmological distance and time for each redshift Z (Hogg 1999 quantities), beside the "
                    + "Hubble-law distance cz/H0 and its error, with the distance uncertainty and its dominant term.",
                    "Named sets: planck2018 (default), ladder2022, eds, and any set another bundle adds. "
                            + "Options change the chosen set; with --omega-lambda the curvature follows from the densities, "
                            + "without it a flat set stays flat."})
    static final class Args {
        @Parameters(paramLabel = "Z", arity = "0..*", description = "redshifts (>= 0, at most 10000)")
        List<String> redshifts = new ArrayList<>();
        @Option(names = "--json", description = "one JSON object per redshift")
        boolean json;
        @Option(names = "--cosmology", paramLabel = "ID", description = "named parameter set (default planck2018)")
        String cosmology;
        @Option(names = "--config", paramLabel = "FILE", description = "key = value file: base, name, citation, h0, omega_m, omega_lambda, w0, wa, t_cmb, n_eff, m_nu, sigma_h0, sigma_omega_m")
        Path config;
        @Option(names = "--h0", paramLabel = "KM_S_MPC", description = "Hubble constant, km/s/Mpc")
        Double h0;
        @Option(names = "--omega-m", paramLabel = "X", description = "matter density today")
        Double omegaM;
        @Option(names = "--omega-lambda", paramLabel = "X", description = "dark-energy density today (curvature follows)")
        Double omegaLambda;
        @Option(names = "--w0", paramLabel = "X", description = "dark-energy equation of state today (-1: cosmological constant)")
        Double w0;
        @Option(names = "--wa", paramLabel = "X", description = "dark-energy equation-of-state slope, w = w0 + wa (1 - a)")
        Double wa;
        @Option(names = "--t-cmb", paramLabel = "K", description = "CMB temperature (0: no radiation)")
        Double tCmb;
        @Option(names = "--n-eff", paramLabel = "N", description = "effective number of neutrino species (shared by three species)")
        Double nEff;
        @Option(names = "--m-nu", paramLabel = "EV[,EV...]", split = ",", description = "masses of up to three massive neutrinos, eV (0: all massless)")
        double[] mNu;
        @Option(names = "--sigma-h0", paramLabel = "KM_S_MPC", description = "uncertainty of H0 for the error budget")
        Double sigmaH0;
        @Option(names = "--sigma-omega-m", paramLabel = "X", description = "uncertainty of omega_m for the error budget")
        Double sigmaOmegaM;
        @Option(names = "--sigma-z", paramLabel = "X", description = "redshift uncertainty (default 0)")
        double sigmaZ;
        @Option(names = "--peculiar-velocity", paramLabel = "KM_S", description = "peculiar-velocity dispersion (default 300 km/s, common practice)")
        double peculiarVelocity = DistanceUncertainty.DEFAULT_PECULIAR_VELOCITY_KM_PER_S;
        @Option(names = "--compare-h0", arity = "0..1", paramLabel = "EARLY,LOCAL", fallbackValue = "",
                description = "also give the distances under an early-universe and a local H0 (default: those of planck2018 and ladder2022), all else equal")
        String compareH0;
        @Option(names = "--at-comoving-mpc", paramLabel = "MPC", description = "also the z at this comoving distance (repeatable)")
        List<Double> atComoving = new ArrayList<>();
        @Option(names = "--at-luminosity-mpc", paramLabel = "MPC", description = "also the z at this luminosity distance (repeatable)")
        List<Double> atLuminosity = new ArrayList<>();
        @Option(names = "--at-lookback-gyr", paramLabel = "GYR", description = "also the z at this lookback time (repeatable)")
        List<Double> atLookback = new ArrayList<>();
        @Option(names = "--frame", paramLabel = "FRAME", description = "correct Z to heliocentric, barycentric, cmb or local-group first (needs --ra/--dec; --mjd for topocentric Z)")
        String frame;
        @Option(names = "--observed-in", paramLabel = "FRAME", description = "frame of the given Z: topocentric (default), heliocentric or barycentric")
        String observedIn = "topocentric";
        @Option(names = "--local-group", paramLabel = "DEF", description = "Local Group definition: yahil1977 (default), iau1976, karachentsev1996, courteau1999")
        String localGroup;
        @Option(names = "--ra", paramLabel = "DEG", description = "right ascension, ICRS degrees")
        Double ra;
        @Option(names = "--dec", paramLabel = "DEG", description = "declination, ICRS degrees")
        Double dec;
        @Option(names = "--mjd", paramLabel = "MJD", description = "exposure mid-point, UTC modified Julian date")
        Double mjd;
        @Option(names = "--site", paramLabel = "LON,LAT[,HEIGHT]", description = "site: east longitude and geodetic latitude in degrees, height in metres")
        String site;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(new CommandLine(a).setUnmatchedOptionsArePositionalParams(true), arguments, ctx.out())) {
            return 0;
        }
        CosmologyParameters params = parameters(a);
        Cosmology cosmo = calculator.of(params);
        List<Double> zs = new ArrayList<>();
        for (String s : a.redshifts) {
            zs.add(parseZ(s));
        }
        try {
            for (double d : a.atComoving) {
                zs.add(cosmo.redshiftAtComovingDistance(d));
            }
            for (double d : a.atLuminosity) {
                zs.add(cosmo.redshiftAtLuminosityDistance(d));
            }
            for (double d : a.atLookback) {
                zs.add(cosmo.redshiftAtLookbackTime(d));
            }
        } catch (InvalidCosmologyException e) {
            throw new UsageException("--at-" + e.parameter().replace('_', '-') + ": " + bare(e));
        }
        if (zs.isEmpty()) {
            throw new UsageException("distance: give at least one redshift Z (or --at-comoving-mpc, --at-luminosity-mpc, --at-lookback-gyr); see --help");
        }
        FrameRequest frameRequest = frameRequest(a);
        SpectrumMetadata meta = metadata(a);
        List<Cosmology> compare = compareSet(a, params);
        PrintStream out = ctx.out();
        if (!a.json) {
            header(out, params);
        }
        List<String> warnings = new ArrayList<>();
        List<String[]> rows = new ArrayList<>();
        for (double zIn : zs) {
            FrameCorrection fc = null;
            double z = zIn;
            if (frameRequest != null) {
                FrameCorrector fr = frames;
                if (fr == null) {
                    throw new UsageException("--frame: no frame-correction service is installed (bundle org.redward.frames)");
                }
                fc = fr.correct(zIn, meta, frameRequest);
                z = fc.z();
            }
            Distances d;
            try {
                d = cosmo.distances(z);
            } catch (InvalidCosmologyException e) {
                throw new UsageException(e.getMessage());
            }
            DistanceUncertainty ul = cosmo.uncertainty(Quantity.LUMINOSITY_MPC, z, a.sigmaZ, a.peculiarVelocity);
            DistanceUncertainty um = cosmo.uncertainty(Quantity.DISTANCE_MODULUS_MAG, z, a.sigmaZ, a.peculiarVelocity);
            List<String> rowWarnings = new ArrayList<>(d.warnings());
            if (fc == null && z > 0 && z < 0.1) {
                rowWarnings.add(String.format(Locale.ROOT, "z=%s is used as given, in no stated frame: the Sun's motion "
                        + "against the CMB (369.82 km/s) can change cz by up to %.1f%% here; give --frame cmb with --ra/--dec "
                        + "(and --mjd/--site for a topocentric z)", g(z), 100 * 369.82 / (CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S * z)));
            }
            if (fc != null && !fc.complete()) {
                rowWarnings.add("z=" + zIn + ": " + frameRequest.to().key() + " frame not reached (" + String.join("; ", fc.notes())
                        + "); distances use the " + fc.reached().key() + " redshift");
            }
            if (a.json) {
                out.println(json(d, ul, um, fc, compare, rowWarnings));
            } else {
                rows.add(textRow(d, ul));
                warnings.addAll(rowWarnings);
                if (fc != null) {
                    warnings.addAll(frameLines(fc));
                }
            }
        }
        if (!a.json) {
            table(out, rows);
            if (!compare.isEmpty()) {
                compareTable(out, zs, compare, frameRequest, meta);
            }
            for (String w : warnings) {
                out.println(w.startsWith("frame") ? w : "warning: " + w);
            }
        }
        return 0;
    }

    /** The message without its leading "parameter: ". */
    private static String bare(InvalidCosmologyException e) {
        String m = e.getMessage();
        return m.startsWith(e.parameter() + ": ") ? m.substring(e.parameter().length() + 2) : m;
    }

    static double parseZ(String s) {
        double z;
        try {
            z = Double.parseDouble(s.trim());
        } catch (NumberFormatException e) {
            throw new UsageException("z: '" + s + "' is not a number");
        }
        if (Double.isNaN(z)) {
            throw new UsageException("z: NaN is not a redshift");
        }
        if (z < 0) {
            throw new UsageException("z: " + s + " is negative; distances need z >= 0 (a blueshift is a peculiar motion, not a distance)");
        }
        if (z > Cosmology.MAX_REDSHIFT) {
            throw new UsageException("z: " + s + " is above the limit " + Cosmology.MAX_REDSHIFT + " of this calculator");
        }
        return z;
    }

    private CosmologyParameters named(String id) {
        Provided<CosmologySet> p = sets.find(id).orElseThrow(() -> new UsageException("--cosmology: no parameter set '" + id
                + "' (available: " + String.join(", ", sets.ids()) + ")"));
        return p.service().parameters();
    }

    CosmologyParameters parameters(Args a) {
        CosmologyParameters base;
        if (a.config != null) {
            base = ParameterFile.read(a.config, this::named, named(a.cosmology != null ? a.cosmology : CosmologyRegistry.DEFAULT_ID));
        } else {
            base = named(a.cosmology != null ? a.cosmology : CosmologyRegistry.DEFAULT_ID);
        }
        CosmologyParameters.Builder b = base.toBuilder();
        List<String> changed = new ArrayList<>();
        if (a.h0 != null) {
            b.h0(a.h0).sigmaH0(0);
            changed.add("h0=" + a.h0);
        }
        if (a.omegaM != null) {
            b.omegaMatter(a.omegaM).sigmaOmegaMatter(0);
            changed.add("omega_m=" + a.omegaM);
        }
        if (a.omegaLambda != null) {
            b.omegaDarkEnergy(a.omegaLambda);
            changed.add("omega_lambda=" + a.omegaLambda);
        }
        if (a.w0 != null) {
            b.w0(a.w0);
            changed.add("w0=" + a.w0);
        }
        if (a.wa != null) {
            b.wa(a.wa);
            changed.add("wa=" + a.wa);
        }
        if (a.tCmb != null) {
            b.cmbTemperatureK(a.tCmb);
            changed.add("t_cmb=" + a.tCmb);
        }
        if (a.nEff != null) {
            b.effectiveNeutrinoSpecies(a.nEff);
            changed.add("n_eff=" + a.nEff);
        }
        if (a.mNu != null) {
            double[] m = java.util.Arrays.stream(a.mNu).filter(x -> x != 0).toArray();
            b.neutrinoMassesEv(m);
            changed.add("m_nu=" + java.util.Arrays.toString(a.mNu));
        }
        if (a.sigmaH0 != null) {
            b.sigmaH0(a.sigmaH0);
        }
        if (a.sigmaOmegaM != null) {
            b.sigmaOmegaMatter(a.sigmaOmegaM);
        }
        if (!changed.isEmpty()) {
            b.name(base.name() + "+custom").citation(base.name() + " changed on the command line: " + String.join(", ", changed));
        }
        try {
            return b.build();
        } catch (InvalidCosmologyException e) {
            throw new UsageException("--" + e.parameter().replace('_', '-') + ": " + bare(e));
        }
    }

    private List<Cosmology> compareSet(Args a, CosmologyParameters params) {
        List<Cosmology> out = new ArrayList<>();
        if (a.compareH0 == null) {
            return out;
        }
        double early;
        double local;
        if (a.compareH0.isBlank()) {
            early = sets.find(NamedSets.PLANCK2018_ID).map(p -> p.service().parameters().h0()).orElse(NamedSets.PLANCK2018.h0());
            local = sets.find(NamedSets.LADDER2022_ID).map(p -> p.service().parameters().h0()).orElse(NamedSets.LADDER2022.h0());
        } else {
            String[] parts = a.compareH0.split(",");
            if (parts.length != 2) {
                throw new UsageException("--compare-h0: give two values EARLY,LOCAL (e.g. 67.66,73.04), got '" + a.compareH0 + "'");
            }
            try {
                early = Double.parseDouble(parts[0].trim());
                local = Double.parseDouble(parts[1].trim());
            } catch (NumberFormatException e) {
                throw new UsageException("--compare-h0: '" + a.compareH0 + "' is not two numbers");
            }
        }
        for (double h : new double[] {early, local}) {
            try {
                out.add(calculator.of(params.toBuilder().h0(h).sigmaH0(0).name(params.name() + "@H0=" + h)
                        .citation(params.name() + " with H0 = " + h).build()));
            } catch (InvalidCosmologyException e) {
                throw new UsageException("--compare-h0: " + e.getMessage());
            }
        }
        return out;
    }

    private static FrameRequest frameRequest(Args a) {
        if (a.frame == null) {
            return null;
        }
        try {
            Frame to = Frame.parse(a.frame);
            Frame from = Frame.parse(a.observedIn);
            SolarMotion lg = a.localGroup == null ? null : SolarMotion.parseLocalGroup(a.localGroup);
            return new FrameRequest(from, to, lg);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--frame/--observed-in/--local-group: " + e.getMessage());
        }
    }

    private static SpectrumMetadata metadata(Args a) {
        SpectrumMetadata.Builder b = SpectrumMetadata.builder();
        if ((a.ra == null) != (a.dec == null)) {
            throw new UsageException("--ra and --dec go together");
        }
        if (a.ra != null) {
            if (!(a.dec >= -90 && a.dec <= 90)) {
                throw new UsageException("--dec: " + a.dec + " is outside -90..90 degrees");
            }
            b.skyPosition(a.ra, a.dec);
        }
        if (a.mjd != null) {
            b.midExposureMjdUtc(a.mjd);
        }
        if (a.site != null) {
            String[] p = a.site.split(",");
            try {
                double lon = Double.parseDouble(p[0].trim());
                double lat = Double.parseDouble(p[1].trim());
                double h = p.length > 2 ? Double.parseDouble(p[2].trim()) : Double.NaN;
                if (!(lat >= -90 && lat <= 90)) {
                    throw new UsageException("--site: latitude " + lat + " is outside -90..90 degrees");
                }
                b.site(lon, lat, h);
            } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
                throw new UsageException("--site: expected LON,LAT[,HEIGHT] in degrees and metres, got '" + a.site + "'");
            }
        }
        return b.build();
    }

    private static void header(PrintStream out, CosmologyParameters p) {
        out.printf(Locale.ROOT, "cosmology %s: H0 = %.4g km/s/Mpc, Omega_m = %.5g, Omega_de = %.5g (w0 = %.3g, wa = %.3g), "
                + "Omega_k = %.3g, Omega_photons = %.3g, Omega_neutrinos = %.3g%s%n", p.name(), p.h0(), p.omegaMatter(),
                p.omegaDarkEnergy(), p.w0(), p.wa(), p.omegaCurvature(), p.omegaPhotons(), p.omegaNeutrinos(),
                p.massiveNeutrinos() ? " (massive: " + java.util.Arrays.toString(p.neutrinoMassesEv()) + " eV)" : "");
        out.println("  source: " + p.citation());
    }

    private static final String[] HEAD = {"z", "D_C/Mpc", "D_M/Mpc", "D_A/Mpc", "D_L/Mpc", "sigma(D_L)", "dominant", "mu/mag",
            "t_L/Gyr", "age/Gyr", "kpc/\"", "cz/H0/Mpc", "HL err vs D_L"};

    private static String[] textRow(Distances d, DistanceUncertainty ul) {
        return new String[] {g(d.z()), g(d.comovingMpc()), g(d.transverseComovingMpc()), g(d.angularDiameterMpc()),
                g(d.luminosityMpc()), g(ul.total()), ul.dominant().replace('_', ' '), f(d.distanceModulusMag(), 3),
                f(d.lookbackGyr(), 4), f(d.ageGyr(), 4), f(d.get(Quantity.SCALE_KPC_PER_ARCSEC), 4), g(d.hubbleLawMpc()),
                String.format(Locale.ROOT, "%+.2f%%", 100 * d.get(Quantity.HUBBLE_LAW_ERROR_VS_LUMINOSITY))};
    }

    private static String g(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.7g", v) : String.valueOf(v);
    }

    private static String f(double v, int digits) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + digits + "f", v) : String.valueOf(v);
    }

    private static void table(PrintStream out, List<String[]> rows) {
        int[] w = new int[HEAD.length];
        for (int i = 0; i < HEAD.length; i++) {
            w[i] = HEAD[i].length();
            for (String[] r : rows) {
                w[i] = Math.max(w[i], r[i].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < HEAD.length; i++) {
            sb.append(i == 0 ? "" : "  ").append(pad(HEAD[i], w[i]));
        }
        out.println(sb);
        for (String[] r : rows) {
            sb.setLength(0);
            for (int i = 0; i < r.length; i++) {
                sb.append(i == 0 ? "" : "  ").append(pad(r[i], w[i]));
            }
            out.println(sb);
        }
    }

    private static String pad(String s, int w) {
        return " ".repeat(Math.max(0, w - s.length())) + s;
    }

    private void compareTable(PrintStream out, List<Double> zs, List<Cosmology> compare, FrameRequest fr, SpectrumMetadata meta) {
        Cosmology early = compare.get(0);
        Cosmology local = compare.get(1);
        out.printf(Locale.ROOT, "H0 compared, all else equal: early H0 = %.4g, local H0 = %.4g km/s/Mpc%n",
                early.parameters().h0(), local.parameters().h0());
        out.printf(Locale.ROOT, "  %10s  %14s  %14s  %8s  %10s  %10s%n", "z", "D_L early/Mpc", "D_L local/Mpc", "diff", "age early", "age local");
        for (double zIn : zs) {
            double z = fr == null || frames == null ? zIn : frames.correct(zIn, meta, fr).z();
            double a = early.luminosityDistanceMpc(z);
            double b = local.luminosityDistanceMpc(z);
            out.printf(Locale.ROOT, "  %10s  %14s  %14s  %+7.2f%%  %10.4f  %10.4f%n", g(z), g(a), g(b), 100 * (b - a) / a,
                    early.ageGyr(z), local.ageGyr(z));
        }
    }

    private static List<String> frameLines(FrameCorrection fc) {
        List<String> out = new ArrayList<>();
        for (FrameStep s : fc.steps()) {
            out.add(String.format(Locale.ROOT, "frame: z=%s %s -> %s: v.n = %+.4f km/s, factor %.12f (%s)", g(fc.input()),
                    s.from().key(), s.to().key(), s.projectedVelocityKmPerS(), s.factor(), s.method()));
        }
        for (String n : fc.notes()) {
            out.add("frame: z=" + g(fc.input()) + ": " + n);
        }
        return out;
    }

    private static Json json(Distances d, DistanceUncertainty ul, DistanceUncertainty um, FrameCorrection fc,
            List<Cosmology> compare, List<String> warnings) {
        CosmologyParameters p = d.parameters();
        Json j = Json.object().put("z", d.z());
        for (Quantity q : Quantity.values()) {
            j.put(q.key(), d.get(q));
        }
        j.put("luminosity_mpc_sigma", ul.total());
        Map<String, Object> terms = new LinkedHashMap<>();
        terms.put("redshift", ul.fromRedshift());
        terms.put("peculiar_velocity", ul.fromPeculiarVelocity());
        terms.put("parameters", ul.fromParameters());
        j.put("luminosity_mpc_sigma_terms", terms);
        j.put("distance_sigma_dominant", ul.dominant());
        j.put("distance_modulus_mag_sigma", um.total());
        j.put("sigma_z", ul.sigmaZ()).put("peculiar_velocity_km_s", ul.peculiarVelocityKmPerS());
        j.put("velocity_optical_km_s", VelocityConvention.OPTICAL.velocityKmPerS(d.z()));
        j.put("velocity_radio_km_s", VelocityConvention.RADIO.velocityKmPerS(d.z()));
        j.put("velocity_relativistic_km_s", VelocityConvention.RELATIVISTIC.velocityKmPerS(d.z()));
        j.put("cosmology", p.name()).put("h0_km_s_mpc", p.h0()).put("omega_m", p.omegaMatter())
                .put("omega_de", p.omegaDarkEnergy()).put("omega_k", p.omegaCurvature()).put("omega_photons", p.omegaPhotons())
                .put("omega_neutrinos", p.omegaNeutrinos()).put("neutrino_masses_ev", p.neutrinoMassesEv())
                .put("w0", p.w0()).put("wa", p.wa()).put("cosmology_source", p.citation());
        if (fc != null) {
            List<Object> steps = new ArrayList<>();
            for (FrameStep s : fc.steps()) {
                steps.add(Json.object().put("from", s.from().key()).put("to", s.to().key())
                        .put("projected_velocity_km_s", s.projectedVelocityKmPerS()).put("factor", s.factor())
                        .put("method", s.method()));
            }
            j.put("z_input", fc.input()).put("frame_requested", fc.request().to().key()).put("frame", fc.reached().key())
                    .put("frame_steps", steps).put("frame_notes", fc.notes());
        }
        if (!compare.isEmpty()) {
            List<Object> cmp = new ArrayList<>();
            for (Cosmology c : compare) {
                Distances e = c.distances(d.z());
                cmp.add(Json.object().put("h0_km_s_mpc", c.parameters().h0()).put("comoving_mpc", e.comovingMpc())
                        .put("angular_diameter_mpc", e.angularDiameterMpc()).put("luminosity_mpc", e.luminosityMpc())
                        .put("distance_modulus_mag", e.distanceModulusMag()).put("lookback_gyr", e.lookbackGyr())
                        .put("age_gyr", e.ageGyr()).put("hubble_law_mpc", e.hubbleLawMpc()));
            }
            j.put("compare_h0", cmp);
        }
        j.put("warnings", warnings);
        return j;
    }
}
