package org.cohesa.core.drying;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.cohesa.core.activity.Miscibility;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * For a blend whose drying path leaves the target sphere, finds slow "tail" solvents from a library that keep
 * the path inside when added in a small amount.
 *
 * <p>Common practice in coatings formulation (no source): the liquid that evaporates last decides what the
 * resin sees at the end, so a little of a slow, good solvent for the resin keeps it dissolved until the film
 * sets. Candidates: library solvents with Hansen parameters, a vapour pressure and a molar volume, inside
 * the sphere on their own (RED &lt; 1), slower than the slowest component of the blend, not carcinogenic,
 * mutagenic or toxic to reproduction (no H340, H350 or H360 statement: a tail solvent stays longest in the
 * room and on the workpiece, and these are the solvents regulation removes), and not splitting
 * from the blend into two liquids (published mutual solubilities with water first, then UNIFAC LLE / Flory–Huggins,
 * {@link WaterMiscibility}, {@link Miscibility}). Each is tried at
 * {@link #FRACTIONS} of the new blend by simulating the whole path; the smallest amount that keeps RED &lt; 1 up
 * to the requested evaporated fraction wins, ties broken by the lower maximum RED.
 */
public final class TailSolventAdvisor {

    /** Amounts tried, volume fraction of the new blend. */
    public static final double[] FRACTIONS = {0.05, 0.10, 0.15, 0.20, 0.30};
    /** Candidates simulated, the closest to the sphere centre first; bounds the work to a fraction of a second. */
    static final int MAX_CANDIDATES = 15;

    private TailSolventAdvisor() {
    }

    /**
     * @param request    the original request (blend, target, temperature, until, model choice); target required
     * @param candidates the library to choose from
     * @param limit      how many suggestions to return at most
     */
    public static List<TailSuggestion> suggest(DryingRequest request, List<Solvent> candidates, int limit) {
        SolubilitySphere target = request.target();
        if (target == null) {
            throw new IllegalArgumentException("a tail solvent can only be suggested for a target sphere");
        }
        Blend blend = request.blend();
        double kelvin = request.kelvin();
        double slowest = Double.POSITIVE_INFINITY;
        for (double c : EvaporationRates.of(blend.solvents(), kelvin).constants()) {
            slowest = Math.min(slowest, c);
        }
        List<Solvent> pool = new ArrayList<>();
        List<Double> poolRates = new ArrayList<>();
        for (Solvent s : candidates) {
            if (!s.hasHansen() || s.effectiveMolarVolume() == null || s.molarMass() == null || s.isCmr()
                    || blend.solvents().stream().anyMatch(b -> b.name().equalsIgnoreCase(s.name()))
                    || target.red(s.hansen()) >= 1) {
                continue;
            }
            double rate;
            try {
                rate = EvaporationRates.relativeRate(s, kelvin);
            } catch (IllegalArgumentException e) {
                continue; // no vapour pressure, or it boils at this temperature
            }
            if (rate < slowest) {
                pool.add(s);
                poolRates.add(rate);
            }
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < pool.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingDouble(i -> target.red(pool.get(i).hansen())));
        List<TailSuggestion> out = new ArrayList<>();
        for (int idx : order.subList(0, Math.min(MAX_CANDIDATES, order.size()))) {
            Solvent s = pool.get(idx);
            for (double f : FRACTIONS) {
                Blend with = withTail(blend, s, f);
                List<Solvent> solvents = with.solvents();
                try {
                    if (WaterMiscibility.judge(solvents, with.fractions(), kelvin, request.waterData()).splits()) {
                        break;
                    }
                    DryingPath path = DryingSimulator.simulate(new DryingRequest(with, target, kelvin, request.until(),
                            request.ideal(), request.pathStep(), false, request.waterData()));
                    if (path.leavesSphereAt() == null) {
                        double maxRed = path.points().stream().mapToDouble(PathPoint::red).max().orElse(0);
                        out.add(new TailSuggestion(s.name(), f, poolRates.get(idx), maxRed, path.lastSolvent()));
                        break;
                    }
                } catch (IllegalArgumentException e) {
                    break; // no activity model for this candidate with the blend
                }
            }
        }
        out.sort(Comparator.comparingDouble(TailSuggestion::fraction).thenComparingDouble(TailSuggestion::maxRed));
        return out.subList(0, Math.min(limit, out.size()));
    }

    /** The blend scaled to 1 − f, plus f of the tail solvent. */
    static Blend withTail(Blend blend, Solvent tail, double f) {
        List<BlendComponent> cs = new ArrayList<>();
        for (BlendComponent c : blend.components()) {
            cs.add(new BlendComponent(c.solvent(), c.fraction() * (1 - f)));
        }
        cs.add(new BlendComponent(tail, f));
        return new Blend(cs);
    }
}
