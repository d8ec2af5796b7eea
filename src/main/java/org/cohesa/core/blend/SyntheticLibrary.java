package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;

/**
 * An invented, reproducible library for benchmarks and checks (it says so in every name: "synthetic-…").
 * Parameters are drawn uniformly from δD 14–21, δP 0–20, δH 0–25 MPa^½, the spread of common solvents and
 * the same distribution as the numpy reference benchmark (../shared/bench/ternary_ref.py); hazard
 * statements are drawn from a short list so hazard scores differ. Never use it for real advice.
 */
public final class SyntheticLibrary {

    /** The benchmark target of the numpy reference: (18, 9, 8) with an invented R0 of 8 MPa^½. */
    public static final SolubilitySphere BENCH_TARGET = SolubilitySphere.of(18.0, 9.0, 8.0, 8.0);

    private static final List<List<String>> HAZARD_SETS = List.of(
            List.of(), List.of("H225"), List.of("H225", "H319"), List.of("H226", "H336"), List.of("H304", "H411"),
            List.of("H360D"), List.of("H351"), List.of("H225", "H301", "H370"), List.of("H315"), List.of("H314"));

    private static final List<String> FAMILIES = List.of("alcohol", "ester", "ketone", "aromatic", "alkane", "ether");

    private SyntheticLibrary() {
    }

    /** {@code n} invented solvents from {@code seed}. */
    public static List<Solvent> generate(int n, long seed) {
        if (n < 1) {
            throw new IllegalArgumentException("library size must be at least 1, got " + n);
        }
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Solvent> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double d = 14 + 7 * rnd.nextDouble();
            double p = 20 * rnd.nextDouble();
            double h = 25 * rnd.nextDouble();
            List<String> hz = HAZARD_SETS.get(rnd.nextInt(HAZARD_SETS.size()));
            double bp = 40 + 180 * rnd.nextDouble();
            double price = Math.round((1 + 20 * rnd.nextDouble()) * 100) / 100.0;
            out.add(new Solvent(String.format("synthetic-%04d", i + 1), List.of(), null, null, null, FAMILIES.get(rnd.nextInt(FAMILIES.size())), null, 100.0, 0.9,
                    100.0 + 50 * rnd.nextDouble(), new HansenParameters(d, p, h), bp, null,
                    new org.cohesa.core.solvent.FireData(bp - 60, null, null, null), null, null, null, hz, false,
                    1 + rnd.nextInt(3), null, price, Map.of(), "invented for benchmarks and checks", false));
        }
        return out;
    }
}
