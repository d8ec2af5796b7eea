package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The front follows the definition of Pareto optimality (Pareto, V., Manuale di economia politica, 1906; any textbook). */
class ParetoFrontTest {

    @Test
    void frontHoldsExactlyTheBlendsNoOtherBeatsOnEveryScore() {
        List<org.cohesa.core.solvent.Solvent> lib = SyntheticLibrary.generate(30, 17);
        CandidatePool pool = CandidatePool.of(lib, BlendConstraints.NONE, SyntheticLibrary.BENCH_TARGET, RankBy.RED);
        List<RankedBlend> blends = BlendSearch.run(SyntheticLibrary.BENCH_TARGET, pool, BlendConstraints.NONE,
                BlendSearch.Settings.of(3, 80, RankBy.RED, 1.0), null, null).blends();
        List<ParetoFront.Point> front = ParetoFront.of(blends);
        List<ParetoFront.Point> all = blends.stream().map(ParetoFront::score).toList();
        assertFalse(front.isEmpty());
        for (ParetoFront.Point p : all) {
            boolean onFront = front.stream().anyMatch(f -> f.blend() == p.blend());
            boolean beaten = all.stream().anyMatch(q -> q.red() <= p.red() && q.hazard() <= p.hazard() && q.cost() <= p.cost()
                    && (q.red() < p.red() || q.hazard() < p.hazard() || q.cost() < p.cost()));
            assertEquals(!beaten, onFront, "blend " + p.blend().blend().describe());
        }
        for (int i = 1; i < front.size(); i++) {
            assertTrue(front.get(i).red() >= front.get(i - 1).red(), "ordered by RED");
        }
    }
}
