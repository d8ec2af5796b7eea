package org.cohesa.core.records;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.cohesa.core.blend.Desirability;
import org.cohesa.core.blend.ProcessUse;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;

/**
 * The evidence section that says why the replacement ranks as it does: the desirability terms of the ranking
 * ({@link Desirability#explain}, the same `why` that `replace` prints) with the default weights, measured on the
 * target's sphere when one is filed (RED limit 0.8), else on the sphere around the replaced liquid (radius and
 * limit of `replace`). Prices are not filed, so the cost term is left out.
 */
final class RankingEvidence {

    private RankingEvidence() {
    }

    static ObjectNode section(Blend replaced, Blend replacement, TargetRef target) {
        ObjectNode o = CanonicalJson.object();
        if (!replacement.hasHansen() || (target == null && !replaced.hasHansen())) {
            return o.put("note", "no ranking terms: a liquid lacks Hansen parameters");
        }
        SolubilitySphere sphere = target != null ? target.sphere() : new SolubilitySphere(replaced.hansen(), Desirability.AROUND_ORIGINAL_RADIUS);
        double limit = target != null ? Desirability.MATERIAL_RED_LIMIT : Desirability.AROUND_ORIGINAL_RED_LIMIT;
        // a single replaced liquid is the reference of the process term, as in replace; a replaced blend has no one rate
        ProcessUse.Rate reference = replaced.size() == 1 ? ProcessUse.rate(replaced.components().get(0).solvent()) : null;
        Desirability.Weights w = replaced.size() == 1 ? Desirability.DEFAULT.withProcess(ProcessUse.AS_ORIGINAL, reference)
                : Desirability.DEFAULT;
        double red = sphere.red(replacement.hansen());
        Desirability.Explanation e = Desirability.explain(replacement.components(), red, limit, w, Double.NaN);
        o.put("sphere", target != null ? "target " + target.label() : "around " + replaced.describe() + ", radius "
                + Desirability.AROUND_ORIGINAL_RADIUS + " MPa^½");
        o.put("red", Math.round(red * 1e4) / 1e4);
        o.put("red_limit", limit);
        o.put("qualifies", red <= limit * (1 + 1e-9));
        o.put("weights", w.describe());
        o.put("score_without_cost", Math.round(e.score() * 1e4) / 1e4);
        ArrayNode why = o.putArray("why");
        e.why().stream().filter(t -> !t.equals("no prices entered")).forEach(why::add);
        o.put("note", "the ranking terms of cohesa replace/blend with the default weights (docs/methods.md, Ranking); prices are not filed");
        return o;
    }
}
