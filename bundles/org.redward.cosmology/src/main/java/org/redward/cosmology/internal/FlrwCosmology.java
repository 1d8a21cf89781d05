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
 * At construction the range z = 0 to {@link #MAX_REDSHIFT} is cut into 231 intervals uniform in
 * {@code ln u} (u changes by 2 per cent in each); on each interval both integrands are replaced
 * by their Chebyshev interpolant of degree 9 (10 evaluations of P), whose integral is a
 * Chebyshev series evaluated by Clenshaw's recurrence (Press et al., Numerical Recipes, 3rd ed.,
 * sections 5.8-5.9: chebft, chint, chebev). The interpolation error on so short an interval is
 * below 1e-15 relative for every integrand here (it is analytic with singularities no closer
 * than u itself); the result is limited by rounding. A value costs a log, a square root and two
 * recurrences of 10 terms, whatever the dark energy or neutrino model; construction costs about
 * 2,500 evaluations of P. The early-universe part of the age uses 16 x 8-point Gauss-Legendre.
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
    /** Per interval, CHEB coefficients of the integral from the interval's lower u (dc then tl). */
    private final double[] dcCheb;
    private final double[] tlCheb;
    private static final int CHEB = 10;
    /** cos(pi j (k + 1/2) / CHEB), row j, column k. */
    private static final double[] COS = new double[CHEB * CHEB];

    static {
        for (int j = 0; j < CHEB; j++) {
            for (int k = 0; k < CHEB; k++) {
                COS[j * CHEB + k] = Math.cos(Math.PI * j * (k + 0.5) / CHEB);
            }
        }
    }
    private volatile FlrwCosmology[] perturbed;
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
        this.dcCheb = new double[n * CHEB];
        this.tlCheb = new double[n * CHEB];
        double[] f1 = new double[CHEB];
        double[] f3 = new double[CHEB];
        double[] c = new double[CHEB];
        for (int i = n - 1; i >= 0; i--) {
            double a = uNode[i];
            double b = uNode[i + 1];
            for (int k = 0; k < CHEB; k++) {
                double x = 0.5 * (a + b) + 0.5 * (b - a) * COS[CHEB + k];
                f1[k] = 2.0 * x / Math.sqrt(pOfU(x));
                f3[k] = f1[k] * x * x;
            }
            chebIntegral(f1, a, b, c);
            System.arraycopy(c, 0, dcCheb, i * CHEB, CHEB);
            chebIntegral(f3, a, b, c);
            System.arraycopy(c, 0, tlCheb, i * CHEB, CHEB);
            dcNode[i] = dcNode[i + 1] + chebev(dcCheb, i, a, b, b);
            tlNode[i] = tlNode[i + 1] + chebev(tlCheb, i, a, b, b);
        }
        double[] piece = new double[2];
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

    /**
     * Chebyshev coefficients (Numerical Recipes chebft then chint) of the integral from a of the
     * function sampled at the CHEB Chebyshev nodes of [a, b] (node k at cos(pi (k + 1/2)/CHEB)).
     */
    private static void chebIntegral(double[] f, double a, double b, double[] out) {
        double[] c = new double[CHEB];
        for (int j = 0; j < CHEB; j++) {
            double sum = 0;
            for (int k = 0; k < CHEB; k++) {
                sum += f[k] * COS[j * CHEB + k];
            }
            c[j] = 2.0 * sum / CHEB;
        }
        double con = 0.25 * (b - a);
        double sum = 0;
        double fac = 1;
        for (int j = 1; j < CHEB - 1; j++) {
            out[j] = con * (c[j - 1] - c[j + 1]) / j;
            sum += fac * out[j];
            fac = -fac;
        }
        out[CHEB - 1] = con * c[CHEB - 2] / (CHEB - 1);
        sum += fac * out[CHEB - 1];
        out[0] = 2.0 * sum;
    }

    /** Clenshaw evaluation (Numerical Recipes chebev) of the series of interval i at x in [a, b]. */
    private static double chebev(double[] coef, int i, double a, double b, double x) {
        int off = i * CHEB;
        double y = (2.0 * x - a - b) / (b - a);
        double y2 = 2.0 * y;
        double d = 0;
        double dd = 0;
        for (int j = CHEB - 1; j > 0; j--) {
            double sv = d;
            d = y2 * d - dd + coef[off + j];
            dd = sv;
        }
        return y * d - dd + 0.5 * coef[off];
    }

    /**
     * Below this z the integrals are taken directly in z (8-point Gauss-Legendre of 1/E and
     * 1/((1+z)E) from 0 to z): u = (1+z)^-1/2 loses the digits of a tiny z.
     */
    private static final double SMALL_Z = 1e-3;

    /** Direct integrals from 0 to z (small z): out[0] = int dz/E, out[1] = int dz/((1+z)E). */
    private void smallZ(double z, double[] out) {
        double half = 0.5 * z;
        double s1 = 0;
        double s3 = 0;
        for (int k = 0; k < GL_X.length; k++) {
            double x = half + half * GL_X[k];
            double w = GL_W[k] / Math.sqrt(p.efunc2(x));
            s1 += w;
            s3 += w / (1.0 + x);
        }
        out[0] = s1 * half;
        out[1] = s3 * half;
    }

    /** Comoving distance in units of D_H; z unchecked. */
    private double dcUnit(double z) {
        return tabulated(z, 0, dcNode, dcCheb);
    }

    /** Lookback time in units of t_H; z unchecked. */
    private double tlUnit(double z) {
        return tabulated(z, 1, tlNode, tlCheb);
    }

    /** One tabulated integral from z to 0 (which = 0 comoving, 1 lookback). */
    private double tabulated(double z, int which, double[] nodes, double[] cheb) {
        if (z < SMALL_Z) {
            double[] out = new double[2];
            smallZ(z, out);
            return out[which];
        }
        double u = 1.0 / Math.sqrt(1.0 + z);
        int i = node(z);
        return nodes[i] - chebev(cheb, i, uNode[i], uNode[i + 1], u);
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
        double a = uNode[i];
        double b = uNode[i + 1];
        double dc;
        double tl;
        if (z < SMALL_Z) {
            double[] out = new double[2];
            smallZ(z, out);
            dc = out[0];
            tl = out[1];
        } else {
            dc = dcNode[i] - chebev(dcCheb, i, a, b, u);
            tl = tlNode[i] - chebev(tlCheb, i, a, b, u);
        }
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
        double x = solver.solve(500, lz -> f.applyAsDouble(Math.min(Math.expm1(lz), MAX_REDSHIFT)) - target, 0.0, Math.log1p(MAX_REDSHIFT));
        return Math.min(Math.expm1(x), MAX_REDSHIFT);
    }

    /** The value of one quantity at z (checked). */
    double value(Quantity q, double z) {
        check(z);
        double[] row = new double[Quantity.values().length];
        fill(z, row);
        return row[q.ordinal()];
    }

    /** H0 +- and Omega_m +- neighbours for the parameter derivatives, built once (benign race: all threads build equal ones). */
    private FlrwCosmology[] perturbed() {
        FlrwCosmology[] pc = perturbed;
        if (pc == null) {
            double dh0 = 1e-4 * p.h0();
            double dom = 1e-4 * Math.max(p.omegaMatter(), 0.01);
            double lo = Math.max(p.omegaMatter() - dom, 0.0);
            pc = new FlrwCosmology[] {this, this, this, this};
            if (p.sigmaH0() > 0) {
                pc[0] = new FlrwCosmology(p.toBuilder().h0(p.h0() + dh0).build());
                pc[1] = new FlrwCosmology(p.toBuilder().h0(p.h0() - dh0).build());
            }
            if (p.sigmaOmegaMatter() > 0) {
                pc[2] = new FlrwCosmology(p.toBuilder().omegaMatter(p.omegaMatter() + dom).build());
                pc[3] = new FlrwCosmology(p.toBuilder().omegaMatter(lo).build());
            }
            perturbed = pc;
        }
        return pc;
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
        FlrwCosmology[] pc = perturbed();
        if (p.sigmaH0() > 0) {
            double t = (pc[0].value(quantity, z) - pc[1].value(quantity, z)) / (pc[0].p.h0() - pc[1].p.h0()) * p.sigmaH0();
            fromParams += t * t;
        }
        if (p.sigmaOmegaMatter() > 0) {
            double t = (pc[2].value(quantity, z) - pc[3].value(quantity, z))
                    / (pc[2].p.omegaMatter() - pc[3].p.omegaMatter()) * p.sigmaOmegaMatter();
            fromParams += t * t;
        }
        return new DistanceUncertainty(quantity, z, v, Math.abs(dqdz) * sigmaZ, Math.abs(dqdz) * sigmaZPec,
                Math.sqrt(fromParams), sigmaZ, peculiarVelocityKmPerS);
    }
}
