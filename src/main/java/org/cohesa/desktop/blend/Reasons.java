package org.cohesa.desktop.blend;

import java.util.Locale;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.RankedBlend;

/**
 * Why a candidate stands where it does: the ranking's own reasons ({@code BlendSuggestion.why()}), or when a
 * suggestion carries none, the search's own scores ({@link RankedBlend#withinLimit()},
 * {@link RankedBlend#rankBy()}, {@link RankedBlend#secondary()}): solvency is the condition, then the chosen key.
 */
final class Reasons {

    private Reasons() {
    }

    static String of(BlendModel.Row r) {
        if (!r.suggestion().why().isEmpty()) {
            return String.join("; ", r.suggestion().why()); // the ranking's own account of what placed it
        }
        RankedBlend b = r.suggestion().blend();
        String solvency = b.withinLimit() ? "inside the RED limit" : "outside the RED limit (listed after every blend inside it, closest first)";
        if (!b.withinLimit() || b.rankBy() == RankBy.RED) {
            return solvency + (b.rankBy() == RankBy.RED ? "; ordered by closeness to the centre (RED " + two(b.red()) + ")" : "");
        }
        double v = b.secondary();
        String then = switch (b.rankBy()) {
            case HAZARD -> "then by safety: hazard score " + two(v) + " (volume-weighted, lower is safer)";
            case COST -> Double.isNaN(v) ? "then by cost: price unknown, so after the priced blends" : "then by cost: " + two(v) + " per litre";
            case COMPONENTS -> "then by simplicity: " + b.size() + (b.size() == 1 ? " liquid" : " liquids");
            case EVAPORATION -> "then by evaporation: " + two(v) + " kPa at 25 °C (volume-weighted vapour pressure, higher dries faster)";
            case RED, DESIRABILITY -> "";
        };
        return solvency + "; " + then;
    }

    private static String two(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
