package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Next tests for the likelihood fit, chosen by expected information: the batch of untested library liquids
 * whose results add most Fisher information about θ = (δD, δP, δH, R0) at the fitted sphere, i.e. shrink the
 * confidence region most.
 *
 * <p>For a liquid x at linear predictor η = (1 − RED)/s, P = ε + (1 − 2ε)·σ(η), one yes/no result carries the
 * Fisher information v·vᵀ with v = (dP/dη)/√(P(1 − P))·∇θη (the Bernoulli information of a generalised linear model:
 * McCullagh, P., Nelder, J. A., <i>Generalized Linear Models</i>, 2nd ed., Chapman &amp; Hall, 1989, ch. 4). The
 * series so far gives I = Σ vᵢvᵢᵀ (graded scores count as one result each). Adding x multiplies det I by
 * 1 + vᵀI⁻¹v, so the volume of the (Wald) 95 % region shrinks by the factor (1 + vᵀI⁻¹v)^−½: the liquid that
 * maximises vᵀI⁻¹v is the most informative (D-optimal design: Atkinson, A. C., Donev, A. N., Tobias, R. D.,
 * <i>Optimum Experimental Designs, with SAS</i>, Oxford University Press, 2007, ch. 10–11, and Chaloner, K.,
 * Larntz, K., <i>J. Stat. Plan. Inference</i> 21 (1989) 191 for logistic models). A batch is picked greedily,
 * adding each pick's information before the next, so five suggestions do not pile up in one spot. The reported
 * shrinkage is that of the region's mean axis, 1 − (det I / det I')^(1/8).
 */
final class InformationAdvisor {

    /** Ridge added to I so that directions no result has informed yet stay finite (relative to the trace). */
    private static final double RIDGE = 1e-6;

    private InformationAdvisor() {
    }

    static List<NextTest> suggest(double[] best, SphereFitter.Data data, List<SolubilitySphere> cloud, List<NamedPoint> untested,
                                  DissolutionModel model, CentrePrior prior, int count) {
        if (count == 0 || untested.isEmpty()) {
            return List.of();
        }
        RealMatrix info = new Array2DRowRealMatrix(4, 4);
        for (int i = 0; i < data.size(); i++) {
            double[] v = direction(data.points[i], best, model);
            info = info.add(outer(v));
        }
        if (prior != null) {
            // the prior adds its precision on each centre component
            info.addToEntry(0, 0, 1 / (prior.sdD() * prior.sdD()));
            info.addToEntry(1, 1, 1 / (prior.sdP() * prior.sdP()));
            info.addToEntry(2, 2, 1 / (prior.sdH() * prior.sdH()));
        }
        double ridge = RIDGE * Math.max(1e-9, info.getTrace());
        for (int k = 0; k < 4; k++) {
            info.addToEntry(k, k, ridge);
        }
        SolubilitySphere fitted = SolubilitySphere.of(best[0], best[1], best[2], best[3]);
        double logDet0 = logDet(info);
        boolean[] picked = new boolean[untested.size()];
        List<NextTest> out = new ArrayList<>();
        for (int k = 0; k < Math.min(count, untested.size()); k++) {
            RealMatrix inverse = new LUDecomposition(info).getSolver().getInverse();
            int pick = -1;
            double bestGain = -1;
            double[] bestV = null;
            for (int i = 0; i < untested.size(); i++) {
                if (picked[i]) {
                    continue;
                }
                double[] v = direction(untested.get(i).point().toArray(), best, model);
                RealVector rv = new ArrayRealVector(v, false);
                double gain = rv.dotProduct(inverse.operate(rv));
                if (gain > bestGain + 1e-12) {
                    bestGain = gain;
                    pick = i;
                    bestV = v;
                }
            }
            picked[pick] = true;
            info = info.add(outer(bestV));
            double shrink = 1 - Math.exp((logDet0 - logDet(info)) / 8);
            NamedPoint cand = untested.get(pick);
            double red = fitted.red(cand.point());
            double share = share(cloud, cand);
            out.add(new NextTest(cand.name(), red, share, reason(red, share, shrink, k), shrink));
        }
        return out;
    }

    /** v = (dP/dη)/√(P(1 − P))·∇η at θ, for a liquid at {@code x}. */
    static double[] direction(double[] x, double[] theta, DissolutionModel model) {
        double ra = Math.max(1e-9, SphereFitter.Data.ra(x, theta));
        double r0 = theta[3];
        double s = model.softness();
        double red = ra / r0;
        double eta = (1 - red) / s;
        double sig = 1 / (1 + Math.exp(-eta));
        double p = model.pDissolves(red);
        double dp = (1 - 2 * model.lapse()) * sig * (1 - sig);
        double scale = dp / Math.sqrt(p * (1 - p));
        // η = (1 − Ra/R0)/s: ∂η/∂c = −(∂Ra/∂c)/(s·R0), ∂Ra/∂cD = −4(xD − cD)/Ra, ∂Ra/∂cP = −(xP − cP)/Ra, …; ∂η/∂R0 = Ra/(s·R0²)
        double k = 1 / (s * r0 * ra);
        return new double[] {scale * 4 * (x[0] - theta[0]) * k, scale * (x[1] - theta[1]) * k, scale * (x[2] - theta[2]) * k,
                scale * ra / (s * r0 * r0)};
    }

    private static RealMatrix outer(double[] v) {
        RealVector rv = new ArrayRealVector(v, false);
        return rv.outerProduct(rv);
    }

    private static double logDet(RealMatrix m) {
        return Math.log(Math.max(1e-300, new LUDecomposition(m).getDeterminant()));
    }

    /** Share of the region's sampled spheres that hold the liquid. */
    private static double share(List<SolubilitySphere> cloud, NamedPoint c) {
        if (cloud.isEmpty()) {
            return Double.NaN;
        }
        long in = cloud.stream().filter(s -> s.contains(c.point())).count();
        return in / (double) cloud.size();
    }

    private static String reason(double red, double share, double shrink, int k) {
        String where = red < 0.9 ? "inside the sphere" : red > 1.1 ? "outside the sphere" : "on the surface";
        return String.format(Locale.ROOT, "RED %.2f, %s; %.0f %% of the plausible spheres hold it; with %s the region is expected to "
                + "shrink by %.0f %%", red, where, 100 * share, k == 0 ? "this result" : "this and the results above", 100 * shrink);
    }
}
