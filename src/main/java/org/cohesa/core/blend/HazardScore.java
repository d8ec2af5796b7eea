package org.cohesa.core.blend;

import java.util.List;
import org.cohesa.core.solvent.Solvent;

/**
 * A screening hazard score of a pure solvent from its GHS H-statements, used only to order blends.
 *
 * <p>This is our own transparent weighting, not a published index (common practice, no source): each hazard
 * family found among the solvent's H-statements adds its weight once — carcinogen, mutagen, reproductive
 * toxicant category 1 (H340, H350, H360…) 10; suspected (H341, H351, H361…) 6; fatal or toxic by any route
 * (H300, H301, H310, H311, H330, H331) 6; organ damage (H370, H372) 5, possible organ damage (H371, H373) 3;
 * corrosive to skin or eyes (H314, H318) 3; harmful (H302, H312, H332) 2; aspiration (H304) 2; extremely or
 * highly flammable (H224, H225) 3, flammable (H226) 2; irritant, sensitiser, drowsiness (H315, H317, H319,
 * H335, H336) 1; aquatic (H400, H410, H411) 2, (H412, H413) 1. A blend's score is the volume-fraction-weighted
 * sum. A solvent with no H-statements in the library scores 0, which may mean "not classified" or "not
 * recorded": the cautions beside each suggestion say which statements are known.
 */
public final class HazardScore {

    private record Family(double weight, List<String> prefixes) {
    }

    private static final List<Family> FAMILIES = List.of(
            new Family(10, List.of("H340", "H350", "H360")),
            new Family(6, List.of("H341", "H351", "H361")),
            new Family(6, List.of("H300", "H301", "H310", "H311", "H330", "H331")),
            new Family(5, List.of("H370", "H372")),
            new Family(3, List.of("H371", "H373")),
            new Family(3, List.of("H314", "H318")),
            new Family(2, List.of("H302", "H312", "H332")),
            new Family(2, List.of("H304")),
            new Family(3, List.of("H224", "H225")),
            new Family(2, List.of("H226")),
            new Family(1, List.of("H315", "H317", "H319", "H335", "H336")),
            new Family(2, List.of("H400", "H410", "H411")),
            new Family(1, List.of("H412", "H413")));

    private HazardScore() {
    }

    /** The score of one solvent (0 when it has no H-statements). */
    public static double of(Solvent s) {
        double score = 0;
        for (Family f : FAMILIES) {
            boolean hit = s.hazardStatements().stream().anyMatch(h -> f.prefixes().stream().anyMatch(h::startsWith));
            if (hit) {
                score += f.weight();
            }
        }
        return score;
    }
}
