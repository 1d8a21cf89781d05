package org.redward.lines.internal;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * A weighted least-squares fit of one or more Gaussians (a blend) plus a constant offset to the
 * continuum-subtracted flux of a window of pixels (weights applied by scaling model and data by
 * sqrt(ivar), the same problem as a diagonal weight matrix but cheaper):
 * <pre>model(lambda) = b + sum_k A_k exp(-(lambda - mu_k)^2 / (2 s_k^2))</pre>
 * with weights equal to the inverse variance, solved by Levenberg-Marquardt (Moré 1978, Lecture
 * Notes in Mathematics 630, 105; Commons Math {@link LevenbergMarquardtOptimizer}) with the
 * analytic Jacobian. The 1-sigma errors are the square roots of the diagonal of the covariance
 * (J^T W J)^-1 at the optimum (common practice for Gaussian noise with correct variances).
 * Parameters are kept in bounds (sign of A, centre inside the window, width between bounds)
 * by clamping at each step. Stateless; thread-safe.
 */
final class BlendFit {

    private BlendFit() {
    }

    /** Fitted parameters (A, mu, s per line, then b) and their covariance; null covariance if singular. */
    record Result(double[] params, double[][] covariance, boolean converged) {
    }

    /**
     * @param x wavelengths of the window's usable pixels
     * @param y continuum-subtracted flux there
     * @param ivar inverse variance there (positive)
     * @param start initial (A, mu, s) per line, then b
     * @param sign +1 emission or -1 absorption for each line
     * @param sMin smallest width allowed, Angstrom, per line
     * @param sMax largest width allowed, Angstrom, per line
     */
    static Result fit(double[] x, double[] y, double[] ivar, double[] start, int[] sign, double[] sMin, double[] sMax) {
        int lines = sign.length;
        int np = 3 * lines + 1;
        double xLo = x[0];
        double[] sw = new double[x.length];
        double[] target = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            sw[i] = Math.sqrt(ivar[i]);
            target[i] = y[i] * sw[i];
        }
        double xHi = x[x.length - 1];
        MultivariateJacobianFunction model = p -> {
            double[] v = p.toArray();
            double[] val = new double[x.length];
            double[][] jac = new double[x.length][np];
            for (int i = 0; i < x.length; i++) {
                double sum = v[np - 1];
                for (int k = 0; k < lines; k++) {
                    double a = v[3 * k];
                    double mu = v[3 * k + 1];
                    double s = v[3 * k + 2];
                    double d = (x[i] - mu) / s;
                    double e = Math.exp(-0.5 * d * d);
                    sum += a * e;
                    jac[i][3 * k] = e;
                    jac[i][3 * k + 1] = a * e * d / s;
                    jac[i][3 * k + 2] = a * e * d * d / s;
                }
                // weighted residuals: model and target both scaled by sqrt(ivar)
                double q = sw[i];
                val[i] = sum * q;
                jac[i][np - 1] = q;
                for (int j = 0; j < np - 1; j++) {
                    jac[i][j] *= q;
                }
            }
            return new Pair<RealVector, RealMatrix>(new ArrayRealVector(val, false), new Array2DRowRealMatrix(jac, false));
        };
        ParameterValidator validator = p -> {
            double[] v = p.toArray();
            for (int k = 0; k < lines; k++) {
                v[3 * k] = sign[k] > 0 ? Math.max(v[3 * k], 0.0) : Math.min(v[3 * k], 0.0);
                v[3 * k + 1] = Math.min(Math.max(v[3 * k + 1], xLo), xHi);
                v[3 * k + 2] = Math.min(Math.max(v[3 * k + 2], sMin[k]), sMax[k]);
            }
            return new ArrayRealVector(v, false);
        };
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .model(model)
                .target(target)
                .start(start)
                .parameterValidator(validator)
                .maxEvaluations(400)
                .maxIterations(200)
                .lazyEvaluation(false)
                .build();
        try {
            LeastSquaresOptimizer.Optimum o = new LevenbergMarquardtOptimizer().optimize(problem);
            double[] p = o.getPoint().toArray();
            double[][] cov;
            try {
                cov = o.getCovariances(1e-14).getData();
            } catch (RuntimeException singular) {
                cov = null;
            }
            return new Result(p, cov, true);
        } catch (RuntimeException notConverged) {
            return new Result(start.clone(), null, false);
        }
    }
}
