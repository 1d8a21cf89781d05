package org.redward.cosmology.internal;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.DistanceColumns;
import org.redward.api.cosmology.DistanceUncertainty;
import org.redward.api.cosmology.Distances;
import org.redward.api.cosmology.InvalidCosmologyException;
import org.redward.api.cosmology.Quantity;

/**
 * FLRW distances and times by Gauss-Legendre quadrature in the variable {@code u = a^(1/2) =
 * (1+z)^(-1/2)}, in which every integrand of Hogg (1999) is smooth down to the big bang:
 *
 * <pre>
 *   D_C(z) = D_H  int_u^1 2u  / sqrt(P(u)) du       (Hogg eq. 15)
 *   t_L(z) = t_H  int_u^1 2u^3 / sqrt(P(u)) du      (Hogg eq. 30)
 *   t(z)   = t_H  int_0^u 2u^3 / sqrt(P(u)) du
 *   P(u)   = a^4 E(z)^2 = Omega_r g(u^2) + Omega_m u^2 + Omega_k u^4 + Omega_de f(u^2) u^8
 * </pre>
 *
 * At construction the two integrals are tabulated from every node {@code u_i} to 1, with nodes
 * uniform in {@code ln u} (step 0.02) from z = {@link #MAX_REDSHIFT} to 0; a value at any z is
 * the node value plus one 8-point Gauss-Legendre piece from u to the next node. The pieces are so
 * short (u changes by 2 per cent at most) that the quadrature error is below 1e-14 relative; the
 * result is limited by rounding (about 1e-15). Construction costs about 4,000 evaluations of P.
 *
 * <p>Immutable and thread-safe.
 */
final class FlrwCosmology implements Cosmology {

    private static final double LN_STEP = 0.02;
    private static final double[] GL_X;
    private static final double[] GL_W;

    static {
        GaussIntegrator g = new GaussIntegratorFactory().legendre(8, -1.0, 1.0);
        GL_X = new double[g.getNumberOfPoints()];
        GL_W = new double[g.getNumberOfPoints()];
        for (int i = 0; i < GL_X.length; i++) {
            GL_X[i] = g.getPoint(i);
            GL_W[i] = g.getWeight(i);
        }
    }

    private final CosmologyParameters p;
    private final double or;
    private final double om;
    private final double ok;
    private final double ode;
    private final boolean lambda;
    private final boolean massiveNu;
    private final double sqrtAbsOk;
    private final double dh;
    private final double th;
    private final double sMin;
    private final double ds;
    private final int n;
    private final double[] uNode;
    private final double[] dcNode;
    private final double[] tlNode;
    /** Age today in units of t_H (infinite without a big bang). */
    private final double age0;

    FlrwCosmology(CosmologyParameters p) {
        this.p = p;
        this.or = p.omegaRadiation();
        this.om = p.omegaMatter();
        this.ok = p.omegaCurvature();
        this.ode = p.omegaDarkEnergy();
        this.lambda = p.cosmologicalConstant();
        this.massiveNu = p.massiveNeutrinos();
        this.sqrtAbsOk = Math.sqrt(Math.abs(ok));
        this.dh = CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S / p.h0();
        this.th = CosmologyParameters.MPC_KM / p.h0() / CosmologyParameters.GYR_S;
        double s0 = -0.5 * Math.log1p(MAX_REDSHIFT);
        this.n = (int) Math.ceil(-s0 / LN_STEP);
        this.ds = -s0 / n;
        this.sMin = s0;
        this.uNode = new double[n + 1];
        this.dcNode = new double[n + 1];
        this.tlNode = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            uNode[i] = i == n ? 1.0 : Math.exp(sMin + i * ds);
        }
        double[] piece = new double[2];
        for (int i = n - 1; i >= 0; i--) {
            integrate(uNode[i], uNode[i + 1], piece);
            dcNode[i] = dcNode[i + 1] + piece[0];
            tlNode[i] = tlNode[i + 1] + piece[1];
        }
        if (or == 0 && om == 0 && ok == 0) {
            age0 = Double.POSITIVE_INFINITY; // de Sitter: no beginning
        } else {
            double early = 0;
            int m = 16;
            for (int k = 0; k < m; k++) {
                integrate(uNode[0] * k / m, uNode[0] * (k + 1) / m, piece);
                early += piece[1];
            }
            age0 = tlNode[0] + early;
        }
    }

    /** P(u) = a^4 E^2 with a = u^2. */
    private double pOfU(double u) {
        double u2 = u * u;
        double u4 = u2 * u2;
        double de = lambda ? ode : ode * p.darkEnergyEvolution(u2);
        double rad = massiveNu ? p.radiationTimesA4(u2) : or;
        return rad + om * u2 + ok * u4 + de * u4 * u4;
    }

    /** Gauss-Legendre integrals of 2u/sqrt(P) and 2u^3/sqrt(P) from a to b (signed). */
    private void integrate(double a, double b, double[] out) {
        double mid = 0.5 * (a + b);
        double half = 0.5 * (b - a);
        double s1 = 0;
        double s3 = 0;
        for (int k = 0; k < GL_X.length; k++) {
            double u = mid + half * GL_X[k];
            double w = GL_W[k] * 2.0 * u / Math.sqrt(pOfU(u));
            s1 += w;
            s3 += w * u * u;
        }
        out[0] = s1 * half;
        out[1] = s3 * half;
    }

    /** Comoving distance in units of D_H; z unchecked. */
    private double dcUnit(double z) {
        double u = 1.0 / Math.sqrt(1.0 + z);
        int i = node(z);
        double b = uNode[i + 1];
        double mid = 0.5 * (u + b);
        double half = 0.5 * (b - u);
        double s1 = 0;
        for (int k = 0; k < GL_X.length; k++) {
            double x = mid + half * GL_X[k];
            s1 += GL_W[k] * x / Math.sqrt(pOfU(x));
        }
        return dcNode[i + 1] + 2.0 * s1 * half;
    }

    /** Lookback time in units of t_H; z unchecked. */
    private double tlUnit(double z) {
        double u = 1.0 / Math.sqrt(1.0 + z);
        int i = node(z);
        double[] piece = new double[2];
        integrate(u, uNode[i + 1], piece);
        return tlNode[i + 1] + piece[1];
    }

    private int node(double z) {
        double s = -0.5 * Math.log1p(z);
        int i = (int) ((s - sMin) / ds);
        return i < 0 ? 0 : (i >= n ? n - 1 : i);
    }

    /** Transverse comoving distance in units of D_H from D_C in units of D_H (Hogg eq. 16). */
    private double dmUnit(double dc) {
        if (ok > 0) {
            return Math.sinh(sqrtAbsOk * dc) / sqrtAbsOk;
        } else if (ok < 0) {
            return Math.sin(sqrtAbsOk * dc) / sqrtAbsOk;
        }
        return dc;
    }

    /** Comoving volume in units of D_H^3 (Hogg eq. 29), with a series where curvature is tiny. */
    private double volumeUnit(double dm) {
        double x2 = dm * dm;
        double kx2 = ok * x2;
        if (Math.abs(kx2) < 1e-5) {
            return 4.0 * Math.PI * dm * x2 * (1.0 / 3.0 - kx2 / 10.0 + 3.0 * kx2 * kx2 / 56.0);
        }
        double root = dm * Math.sqrt(1.0 + kx2);
        double arc = ok > 0 ? asinh(sqrtAbsOk * dm) : Math.asin(sqrtAbsOk * dm);
        return 4.0 * Math.PI / (2.0 * ok) * (root - arc / sqrtAbsOk);
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1.0));
    }

    private static void check(double z) {
        if (Double.isNaN(z)) {
            throw new InvalidCosmologyException("z", "z must be a number >= 0, got NaN");
        }
        if (z < 0) {
            throw new InvalidCosmologyException("z", "z must be >= 0 (blueshifts are not cosmological distances), got " + z);
        }
        if (z > MAX_REDSHIFT) {
            throw new InvalidCosmologyException("z", "z = " + z + " is above the limit " + MAX_REDSHIFT + " of this calculator");
        }
    }

    @Override
    public CosmologyParameters parameters() {
        return p;
    }

    @Override
    public double hubbleDistanceMpc() {
        return dh;
    }

    @Override
    public double hubbleTimeGyr() {
        return th;
    }

    @Override
    public double efunc(double z) {
        check(z);
        return Math.sqrt(p.efunc2(z));
    }

    @Override
    public double comovingDistanceMpc(double z) {
        check(z);
        return dh * dcUnit(z);
    }

    @Override
    public double transverseComovingDistanceMpc(double z) {
        check(z);
        return dh * dmUnit(dcUnit(z));
    }

    @Override
    public double transverseComovingDistanceMpc(double z1, double z2) {
        check(z1);
        check(z2);
        if (z2 < z1) {
            throw new InvalidCosmologyException("z2", "z2 must be >= z1 (" + z2 + " < " + z1 + ")");
        }
        return dh * dmUnit(dcUnit(z2) - dcUnit(z1));
    }

    @Override
    public double angularDiameterDistanceMpc(double z) {
        return transverseComovingDistanceMpc(z) / (1.0 + z);
    }

    @Override
    public double angularDiameterDistanceMpc(double z1, double z2) {
        return transverseComovingDistanceMpc(z1, z2) / (1.0 + z2);
    }

    @Override
    public double luminosityDistanceMpc(double z) {
        return transverseComovingDistanceMpc(z) * (1.0 + z);
    }

    @Override
    public double distanceModulusMag(double z) {
        return 5.0 * Math.log10(luminosityDistanceMpc(z)) + 25.0;
    }

    @Override
    public double lookbackTimeGyr(double z) {
        check(z);
        return th * tlUnit(z);
    }

    @Override
    public double ageGyr(double z) {
        check(z);
        return th * (age0 - tlUnit(z));
    }

    @Override
    public double comovingVolumeGpc3(double z) {
        check(z);
        return dh * dh * dh * volumeUnit(dmUnit(dcUnit(z))) * 1e-9;
    }

    @Override
    public double differentialComovingVolumeMpc3PerSr(double z) {
        check(z);
        double dm = dmUnit(dcUnit(z));
        return dh * dh * dh * dm * dm / Math.sqrt(p.efunc2(z));
    }

    @Override
    public Distances distances(double z) {
        check(z);
        double[] row = new double[Quantity.values().length];
        fill(z, row);
        Map<Quantity, Double> values = new EnumMap<>(Quantity.class);
        for (Quantity q : Quantity.values()) {
            values.put(q, row[q.ordinal()]);
        }
        return Distances.of(z, p, values, warnings(z, row));
    }

    private List<String> warnings(double z, double[] row) {
        List<String> w = new ArrayList<>();
        double ec = row[Quantity.HUBBLE_LAW_ERROR_VS_COMOVING.ordinal()];
        double el = row[Quantity.HUBBLE_LAW_ERROR_VS_LUMINOSITY.ordinal()];
        double ea = row[Quantity.HUBBLE_LAW_ERROR_VS_ANGULAR_DIAMETER.ordinal()];
        double worst = Math.max(Math.abs(ec), Math.max(Math.abs(el), Math.abs(ea)));
        if (worst > HUBBLE_LAW_WARNING) {
            w.add(String.format(Locale.ROOT, "z=%s: the Hubble-law distance cz/H0 = %.6g Mpc is off by %+.2f%% against "
                    + "the comoving, %+.2f%% against the luminosity and %+.2f%% against the angular diameter distance; "
                    + "v = H0 d is only the low-z limit, use the exact distances", fmt(z),
                    row[Quantity.HUBBLE_LAW_MPC.ordinal()], 100 * ec, 100 * el, 100 * ea));
        }
        if (z < 0.01 && z > 0) {
            w.add(String.format(Locale.ROOT, "z=%s: a peculiar velocity of 300 km/s is %.0f%% of cz here; "
                    + "the distance is dominated by the peculiar-velocity uncertainty", fmt(z),
                    100 * 300.0 / (CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S * z)));
        }
        if (ok < 0 && row[Quantity.TRANSVERSE_COMOVING_MPC.ordinal()] < 0) {
            w.add("z=" + fmt(z) + ": beyond the antipode of this closed universe; transverse distances are negative");
        }
        return w;
    }

    private static String fmt(double z) {
        return String.format(Locale.ROOT, "%.6g", z);
    }

    /** Every quantity at z (unchecked) into row, indexed by Quantity ordinal. */
    private void fill(double z, double[] row) {
        double u = 1.0 / Math.sqrt(1.0 + z);
        int i = node(z);
        double b = uNode[i + 1];
        double mid = 0.5 * (u + b);
        double half = 0.5 * (b - u);
        double s1 = 0;
        double s3 = 0;
        for (int k = 0; k < GL_X.length; k++) {
            double x = mid + half * GL_X[k];
            double w = GL_W[k] * x / Math.sqrt(pOfU(x));
            s1 += w;
            s3 += w * x * x;
        }
        double dc = dcNode[i + 1] + 2.0 * s1 * half;
        double tl = tlNode[i + 1] + 2.0 * s3 * half;
        double dm = dmUnit(dc);
        double onePlusZ = 1.0 + z;
        double u2 = u * u;
        double e = Math.sqrt(pOfU(u)) / (u2 * u2);
        double dcMpc = dh * dc;
        double dmMpc = dh * dm;
        double daMpc = dmMpc / onePlusZ;
        double dlMpc = dmMpc * onePlusZ;
        double hl = dh * z;
        row[Quantity.COMOVING_MPC.ordinal()] = dcMpc;
        row[Quantity.TRANSVERSE_COMOVING_MPC.ordinal()] = dmMpc;
        row[Quantity.ANGULAR_DIAMETER_MPC.ordinal()] = daMpc;
        row[Quantity.LUMINOSITY_MPC.ordinal()] = dlMpc;
        row[Quantity.DISTANCE_MODULUS_MAG.ordinal()] = 5.0 * Math.log10(dlMpc) + 25.0;
        row[Quantity.LOOKBACK_GYR.ordinal()] = th * tl;
        row[Quantity.AGE_GYR.ordinal()] = th * (age0 - tl);
        row[Quantity.HUBBLE_LAW_MPC.ordinal()] = hl;
        row[Quantity.HUBBLE_LAW_ERROR_VS_COMOVING.ordinal()] = z == 0 ? 0 : (hl - dcMpc) / dcMpc;
        row[Quantity.HUBBLE_LAW_ERROR_VS_LUMINOSITY.ordinal()] = z == 0 ? 0 : (hl - dlMpc) / dlMpc;
        row[Quantity.HUBBLE_LAW_ERROR_VS_ANGULAR_DIAMETER.ordinal()] = z == 0 ? 0 : (hl - daMpc) / daMpc;
        row[Quantity.HUBBLE_PARAMETER_KM_S_MPC.ordinal()] = p.h0() * e;
        row[Quantity.SCALE_KPC_PER_ARCSEC.ordinal()] = daMpc * 1000.0 * Math.PI / 648000.0;
        row[Quantity.COMOVING_VOLUME_GPC3.ordinal()] = dh * dh * dh * volumeUnit(dm) * 1e-9;
        row[Quantity.COMOVING_VOLUME_PER_DZ_PER_SR_MPC3.ordinal()] = dh * dh * dh * dm * dm / e;
    }

    @Override
    public DistanceColumns distances(double[] z) {
        Quantity[] qs = Quantity.values();
        double[][] cols = new double[qs.length][z.length];
        double[] row = new double[qs.length];
        for (int r = 0; r < z.length; r++) {
            double zr = z[r];
            if (zr >= 0 && zr <= MAX_REDSHIFT) {
                fill(zr, row);
                for (int q = 0; q < qs.length; q++) {
                    cols[q][r] = row[q];
                }
            } else {
                for (int q = 0; q < qs.length; q++) {
                    cols[q][r] = Double.NaN;
                }
            }
        }
        Map<Quantity, double[]> map = new EnumMap<>(Quantity.class);
        for (Quantity q : qs) {
            map.put(q, cols[q.ordinal()]);
        }
        return DistanceColumns.wrap(p, z.clone(), map);
    }

    @Override
    public double redshiftAtComovingDistance(double mpc) {
        return invert("comoving_mpc", mpc, this::comovingDistanceMpc);
    }

    @Override
    public double redshiftAtLuminosityDistance(double mpc) {
        return invert("luminosity_mpc", mpc, this::luminosityDistanceMpc);
    }

    @Override
    public double redshiftAtLookbackTime(double gyr) {
        return invert("lookback_gyr", gyr, this::lookbackTimeGyr);
    }

    private static double invert(String what, double target, DoubleUnaryOperator f) {
        double top = f.applyAsDouble(MAX_REDSHIFT);
        if (!(target >= 0 && target <= top)) {
            throw new InvalidCosmologyException(what, String.format(Locale.ROOT,
                    "%s must lie between 0 and %.8g (its value at z = %g) in this cosmology, got %s", what, top,
                    MAX_REDSHIFT, target));
        }
        if (target == 0) {
            return 0;
        }
        // Brent's method (commons-math3) on the monotonic function; bracket in ln(1+z) for conditioning.
        BrentSolver solver = new BrentSolver(1e-13, 1e-15, 1e-300);
        double x = solver.solve(500, lz -> f.applyAsDouble(Math.expm1(lz)) - target, 0.0, Math.log1p(MAX_REDSHIFT));
        return Math.expm1(x);
    }

    /** The value of one quantity at z (checked). */
    double value(Quantity q, double z) {
        check(z);
        double[] row = new double[Quantity.values().length];
        fill(z, row);
        return row[q.ordinal()];
    }

    @Override
    public DistanceUncertainty uncertainty(Quantity quantity, double z, double sigmaZ, double peculiarVelocityKmPerS) {
        check(z);
        if (!(sigmaZ >= 0)) {
            throw new InvalidCosmologyException("sigma_z", "sigma_z must be >= 0, got " + sigmaZ);
        }
        if (!(peculiarVelocityKmPerS >= 0)) {
            throw new InvalidCosmologyException("peculiar_velocity", "the peculiar-velocity dispersion must be >= 0 km/s, got " + peculiarVelocityKmPerS);
        }
        double v = value(quantity, z);
        double h = 1e-5 * (1.0 + z);
        double dqdz;
        if (z >= h) {
            dqdz = (value(quantity, Math.min(z + h, MAX_REDSHIFT)) - value(quantity, z - h)) / (Math.min(z + h, MAX_REDSHIFT) - (z - h));
        } else {
            dqdz = (value(quantity, z + h) - v) / h;
        }
        double sigmaZPec = (1.0 + z) * peculiarVelocityKmPerS / CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S;
        double fromParams = 0;
        if (p.sigmaH0() > 0) {
            double d = 1e-4 * p.h0();
            double plus = new FlrwCosmology(p.toBuilder().h0(p.h0() + d).build()).value(quantity, z);
            double minus = new FlrwCosmology(p.toBuilder().h0(p.h0() - d).build()).value(quantity, z);
            double t = (plus - minus) / (2 * d) * p.sigmaH0();
            fromParams += t * t;
        }
        if (p.sigmaOmegaMatter() > 0) {
            double d = 1e-4 * Math.max(p.omegaMatter(), 0.01);
            double lo = Math.max(p.omegaMatter() - d, 0.0);
            double plus = new FlrwCosmology(p.toBuilder().omegaMatter(p.omegaMatter() + d).build()).value(quantity, z);
            double minus = new FlrwCosmology(p.toBuilder().omegaMatter(lo).build()).value(quantity, z);
            double t = (plus - minus) / (p.omegaMatter() + d - lo) * p.sigmaOmegaMatter();
            fromParams += t * t;
        }
        return new DistanceUncertainty(quantity, z, v, Math.abs(dqdz) * sigmaZ, Math.abs(dqdz) * sigmaZPec,
                Math.sqrt(fromParams), sigmaZ, peculiarVelocityKmPerS);
    }
}
