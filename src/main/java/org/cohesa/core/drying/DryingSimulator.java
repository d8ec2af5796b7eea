package org.cohesa.core.drying;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.ode.ContinuousOutputModel;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.cohesa.core.activity.ActivityModel;
import org.cohesa.core.activity.ActivityModels;
import org.cohesa.core.activity.WaterJudgement;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.Solvent;

/**
 * Simulates the isothermal evaporation of a liquid blend from an open film and follows its composition,
 * Hansen parameters and RED to a target along the way.
 *
 * <p>Rate equations: {@link EvaporationRates} (duᵢ/dτ ∝ xᵢγᵢPᵢˢᵃᵗ at the common, evaporatively cooled film temperature), activity coefficients from
 * {@link ActivityModels#choose} (original UNIFAC, Hansen–Flory–Huggins fallback, or ideal). Integrated with
 * Commons Math's adaptive Dormand–Prince 8(5,3) method (Dormand, J. R., Prince, P. J., <i>J. Comput. Appl.
 * Math.</i> 6 (1980) 19; Hairer, Nørsett, Wanner, <i>Solving Ordinary Differential Equations I</i>, 2nd ed.,
 * Springer 1993) with event functions that stop at the target evaporated fraction and whenever a component
 * runs out (its remaining volume falls below {@value #EXHAUSTED} of the initial volume; the trace left is
 * booked as evaporated and the integration restarts without it). The summary reports a component as practically
 * gone where less than {@value #PRACTICALLY_GONE} of its own initial volume is left, found on the same dense output
 * the path's points are read from, so the two agree. Liquid–liquid splits along the path are judged by
 * {@link WaterMiscibility} (published mutual solubilities with water first, the UNIFAC LLE model elsewhere). The state also carries each component's
 * evaporated volume, so the mass balance remaining + evaporated = initial is checked at the end; an
 * explicit Runge–Kutta method keeps such linear invariants to round-off. The blend's parameters along the
 * path follow the volume-fraction mixing rule (Hansen 2007, ch. 1), RED = Ra/R0.
 */
public final class DryingSimulator {

    /**
     * Remaining volume (fraction of the blend's initial volume) below which the integration drops a component: a
     * numerical cut-off for the exponential tail (x → 0 makes the rate → 0), far below anything reported.
     */
    public static final double EXHAUSTED = 1e-8;
    /**
     * A component counts as practically gone, for the summary, once less than this fraction of its own initial volume
     * is left (0.1 %; our own reporting threshold, no source): the path's table shows it as 0.000 from about there on.
     */
    public static final double PRACTICALLY_GONE = 1e-3;
    private static final double ABS_TOL = 1e-12;
    private static final double REL_TOL = 1e-10;
    private static final double TAU_MAX = 1e9;

    private DryingSimulator() {
    }

    public static DryingPath simulate(DryingRequest request) {
        return simulate(request, EvaporationRates.Calibration.FITTED);
    }

    /** With another evaporation calibration (for comparisons and the tests of the calibration). */
    static DryingPath simulate(DryingRequest request, EvaporationRates.Calibration calibration) {
        Blend blend = request.blend();
        List<Solvent> solvents = blend.solvents();
        int k = solvents.size();
        double kelvin = request.kelvin();
        SolubilitySphere target = request.target();
        if (target != null) {
            for (Solvent s : solvents) {
                if (!s.hasHansen()) {
                    throw new org.cohesa.core.InvalidInputException("blend", s.name(),
                            "has no Hansen parameters in the library, so its RED to the target cannot be followed");
                }
            }
        }
        EvaporationRates rates = EvaporationRates.of(solvents, kelvin, calibration);
        ActivityModel model = ActivityModels.choose(solvents, request.ideal());
        double[] v = org.cohesa.core.activity.Composition.molarVolumes(solvents);
        Film film = new Film(rates, v, model, kelvin);

        double[] y = new double[2 * k];
        double[] initial = blend.fractions();
        System.arraycopy(initial, 0, y, 0, k);
        boolean[] active = new boolean[k];
        for (int i = 0; i < k; i++) {
            active[i] = initial[i] > 0;
            if (!active[i]) {
                y[i] = 0;
            }
        }
        List<Segment> segments = new ArrayList<>();
        List<Double> stepTimes = new ArrayList<>();
        List<String> notes = new ArrayList<>(rates.notes());
        double tau = 0;
        double until = request.until();
        stepTimes.add(0.0);
        while (true) {
            film.active = active.clone();
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, 1e8, ABS_TOL, REL_TOL);
            integrator.setInitialStepSize(1e-3 / maxRate(rates.constants(), active));
            ContinuousOutputModel dense = new ContinuousOutputModel();
            integrator.addStepHandler(dense);
            integrator.addStepHandler(new StepTimes(stepTimes));
            Stop stop = new Stop();
            integrator.addEventHandler(new TargetReached(k, until, stop), 1e6, 1e-13, 200);
            for (int i = 0; i < k; i++) {
                if (active[i] && countActive(active) > 1) {
                    integrator.addEventHandler(new RunsOut(i, stop), 1e6, 1e-13, 200);
                }
            }
            double start = tau;
            tau = integrator.integrate(film, tau, y, TAU_MAX, y);
            segments.add(new Segment(start, tau, dense));
            if (stop.reason == Stop.Reason.TARGET) {
                break;
            }
            if (stop.reason == Stop.Reason.RUNS_OUT) {
                for (int i = 0; i < k; i++) {
                    if (active[i] && y[i] <= EXHAUSTED * (1 + 1e-6)) {
                        y[k + i] += y[i];
                        y[i] = 0;
                        active[i] = false;
                    }
                }
                continue;
            }
            notes.add(String.format(Locale.ROOT, "only %.1f %% of the volume evaporates within the simulated time: the rest is practically non-volatile",
                    100 * evaporated(y, k)));
            break;
        }
        double balance = 0;
        for (int i = 0; i < k; i++) {
            balance = Math.max(balance, Math.abs(y[i] + y[k + i] - initial[i]));
        }
        Trajectory traj = new Trajectory(segments, k);
        List<PathPoint> points = new ArrayList<>();
        double end = Math.min(until, evaporated(y, k));
        List<Double> marks = new ArrayList<>();
        for (int m = 0; m * request.pathStep() < end - 1e-9; m++) {
            marks.add(m * request.pathStep());
        }
        marks.add(end);
        for (double mark : marks) {
            double t = mark == 0 ? 0 : traj.timeAtEvaporated(mark, tau);
            points.add(point(solvents, traj.state(t), t, target));
        }
        Double leaves = null;
        if (target != null) {
            if (points.get(0).red() >= 1) {
                leaves = 0.0;
                notes.add("the blend starts outside the target sphere (RED ≥ 1)");
            } else {
                Double crossing = firstCrossing(traj, stepTimes, tau, solvents, target);
                if (crossing != null) {
                    PathPoint p = point(solvents, traj.state(crossing), crossing, target);
                    leaves = p.evaporated();
                    points.add(p);
                    points.sort((a, b) -> Double.compare(a.evaporated(), b.evaporated()));
                }
            }
        }
        Double splitsAt = null;
        WaterJudgement phases = null;
        if (request.checkMiscibility() && k > 1) {
            for (PathPoint p : points) {
                double[] phi = p.composition().values().stream().mapToDouble(Double::doubleValue).toArray();
                WaterJudgement j = WaterMiscibility.judge(solvents, phi, kelvin, request.waterData());
                if (phases == null || j.splits()) {
                    phases = j;
                }
                if (j.splits()) {
                    splitsAt = p.evaporated();
                    break;
                }
            }
        }
        List<DryingPath.Exhaustion> gone = practicallyGone(traj, solvents, initial, tau);
        PathPoint last = points.get(points.size() - 1);
        String lastSolvent = last.composition().entrySet().stream().max(Map.Entry.comparingByValue()).orElseThrow().getKey();
        return new DryingPath(points, leaves, lastSolvent, model.name(), model.note(), gone, splitsAt, phases, notes, balance);
    }

    /**
     * Each component's moment of falling below {@link #PRACTICALLY_GONE} of its initial volume (bisection on the dense
     * output; a component's remaining volume only falls), in order; components still above it at the end are left out.
     */
    private static List<DryingPath.Exhaustion> practicallyGone(Trajectory traj, List<Solvent> solvents, double[] initial, double tauEnd) {
        int k = solvents.size();
        List<DryingPath.Exhaustion> out = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            double threshold = PRACTICALLY_GONE * initial[i];
            if (initial[i] <= 0 || traj.state(tauEnd)[i] > threshold) {
                continue;
            }
            double lo = 0;
            double hi = tauEnd;
            for (int it = 0; it < 200 && hi - lo > 1e-13 * Math.max(1, hi); it++) {
                double mid = 0.5 * (lo + hi);
                if (traj.state(mid)[i] > threshold) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            out.add(new DryingPath.Exhaustion(solvents.get(i).name(), evaporated(traj.state(hi), k), hi));
        }
        out.sort((a, b) -> Double.compare(a.time(), b.time()));
        return out;
    }

    /** Relative time of the first rise of RED through 1 (bisection between recorded steps), or null. */
    private static Double firstCrossing(Trajectory traj, List<Double> stepTimes, double tauEnd, List<Solvent> solvents,
                                        SolubilitySphere target) {
        double prevT = 0;
        for (double t : stepTimes) {
            if (t <= prevT || t > tauEnd) {
                continue;
            }
            if (red(solvents, traj.state(t), target) >= 1) {
                double lo = prevT;
                double hi = t;
                for (int it = 0; it < 100 && hi - lo > 1e-12 * Math.max(1, hi); it++) {
                    double mid = 0.5 * (lo + hi);
                    if (red(solvents, traj.state(mid), target) >= 1) {
                        hi = mid;
                    } else {
                        lo = mid;
                    }
                }
                return hi;
            }
            prevT = t;
        }
        return null;
    }

    private static double red(List<Solvent> solvents, double[] y, SolubilitySphere target) {
        return target.red(mix(solvents, fractions(y, solvents.size())));
    }

    private static PathPoint point(List<Solvent> solvents, double[] y, double t, SolubilitySphere target) {
        int k = solvents.size();
        double[] phi = fractions(y, k);
        Map<String, Double> comp = new LinkedHashMap<>();
        for (int i = 0; i < k; i++) {
            comp.put(solvents.get(i).name(), phi[i]);
        }
        boolean all = solvents.stream().allMatch(Solvent::hasHansen);
        HansenParameters h = all ? mix(solvents, phi) : null;
        Double red = target == null ? null : target.red(h);
        return new PathPoint(evaporated(y, k), t, comp, h, red);
    }

    private static HansenParameters mix(List<Solvent> solvents, double[] phi) {
        double d = 0;
        double p = 0;
        double h = 0;
        for (int i = 0; i < phi.length; i++) {
            HansenParameters s = solvents.get(i).hansen();
            d += phi[i] * s.dD();
            p += phi[i] * s.dP();
            h += phi[i] * s.dH();
        }
        return new HansenParameters(d, p, h);
    }

    /** Volume fractions of the remaining liquid. */
    static double[] fractions(double[] y, int k) {
        double total = 0;
        double[] phi = new double[k];
        for (int i = 0; i < k; i++) {
            phi[i] = Math.max(0, y[i]);
            total += phi[i];
        }
        for (int i = 0; i < k; i++) {
            phi[i] /= total;
        }
        return phi;
    }

    static double evaporated(double[] y, int k) {
        double left = 0;
        for (int i = 0; i < k; i++) {
            left += Math.max(0, y[i]);
        }
        return 1 - left;
    }

    private static double maxRate(double[] c, boolean[] active) {
        double m = 0;
        for (int i = 0; i < c.length; i++) {
            if (active[i]) {
                m = Math.max(m, c[i]);
            }
        }
        return m > 0 ? m : 1;
    }

    private static int countActive(boolean[] active) {
        int n = 0;
        for (boolean a : active) {
            n += a ? 1 : 0;
        }
        return n;
    }

    /** The rate equations; state = remaining volumes u (k), then evaporated volumes e (k), both per initial volume. */
    private static final class Film implements FirstOrderDifferentialEquations {
        private final EvaporationRates rates;
        private final double[] v;
        private final ActivityModel model;
        private final double kelvin;
        private final int k;
        boolean[] active;

        Film(EvaporationRates rates, double[] v, ActivityModel model, double kelvin) {
            this.rates = rates;
            this.v = v;
            this.model = model;
            this.kelvin = kelvin;
            this.k = v.length;
        }

        @Override
        public int getDimension() {
            return 2 * k;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            double[] x = new double[k];
            double total = 0;
            for (int i = 0; i < k; i++) {
                x[i] = active[i] ? Math.max(0, y[i]) / v[i] : 0;
                total += x[i];
            }
            if (!(total > 0)) {
                // a trial stage that overshot every component: any finite slope will do, the step is rejected
                java.util.Arrays.fill(yDot, 0.0);
                yDot[0] = 1.0;
                return;
            }
            for (int i = 0; i < k; i++) {
                x[i] /= total;
            }
            double[] rate = rates.rates(x, model.gamma(x, kelvin), active);
            for (int i = 0; i < k; i++) {
                yDot[i] = -rate[i];
                yDot[k + i] = rate[i];
            }
        }
    }

    private static final class Stop {
        enum Reason { NONE, TARGET, RUNS_OUT }

        Reason reason = Reason.NONE;
    }

    private static final class TargetReached implements EventHandler {
        private final int k;
        private final double until;
        private final Stop stop;

        TargetReached(int k, double until, Stop stop) {
            this.k = k;
            this.until = until;
            this.stop = stop;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return evaporated(y, k) - until;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            stop.reason = Stop.Reason.TARGET;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    private static final class RunsOut implements EventHandler {
        private final int i;
        private final Stop stop;

        RunsOut(int i, Stop stop) {
            this.i = i;
            this.stop = stop;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[i] - EXHAUSTED;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (stop.reason != Stop.Reason.TARGET) {
                stop.reason = Stop.Reason.RUNS_OUT;
            }
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    private static final class StepTimes implements StepHandler {
        private final List<Double> times;

        StepTimes(List<Double> times) {
            this.times = times;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            times.add(interpolator.getCurrentTime());
        }
    }

    private record Segment(double start, double end, ContinuousOutputModel dense) {
    }

    /** The whole path as a function of relative time, across the restarts at each exhaustion. */
    private static final class Trajectory {
        private final List<Segment> segments;
        private final int k;

        Trajectory(List<Segment> segments, int k) {
            this.segments = segments;
            this.k = k;
        }

        double[] state(double t) {
            for (Segment s : segments) {
                if (t <= s.end || s == segments.get(segments.size() - 1)) {
                    s.dense.setInterpolatedTime(Math.max(s.start, Math.min(t, s.end)));
                    return s.dense.getInterpolatedState();
                }
            }
            throw new IllegalStateException("no path segments");
        }

        /** τ where the evaporated fraction equals {@code target} (it rises monotonically). */
        double timeAtEvaporated(double target, double tauEnd) {
            double lo = 0;
            double hi = tauEnd;
            for (int it = 0; it < 200 && hi - lo > 1e-13 * Math.max(1, hi); it++) {
                double mid = 0.5 * (lo + hi);
                if (evaporated(state(mid), k) < target) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            return hi;
        }
    }
}
