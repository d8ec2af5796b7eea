package org.cohesa.cli.blend;

import org.cohesa.cli.Output;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.CandidatePool;
import org.cohesa.core.blend.ProgressListener;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.RankedBlend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.BlendSpec;

/** Shared printing of blend suggestions (table and JSON) for {@code blend} and {@code replace}. */
public final class BlendView {

    static final String SCREENING = "Screening estimates only: the supplier's SDS, local codes and your site's licensed safety "
            + "professionals decide; test every blend in the lab before use.";

    private BlendView() {
    }

    /** "toluene 60 %, ethanol 40 %". */
    static String describe(RankedBlend b) {
        return b.components().stream().map(c -> c.solvent().name() + " " + percent(c.fraction())).collect(Collectors.joining(", "));
    }

    static String percent(double f) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * f);
    }

    static String secondaryLabel(RankBy r) {
        return switch (r) {
            case RED -> null;
            case HAZARD -> "hazard score";
            case COST -> "price/L";
            case COMPONENTS -> "components";
            case EVAPORATION -> "p* 25 °C kPa";
        };
    }

    static String secondaryText(RankedBlend b) {
        return switch (b.rankBy()) {
            case RED -> "";
            case COMPONENTS -> String.valueOf(b.size());
            case HAZARD, EVAPORATION -> Output.fmt(b.secondary(), 2);
            case COST -> Output.fmt(b.secondary(), 2);
        };
    }

    static String phaseText(BlendSuggestion s) {
        if (s.phase() == null) {
            return "single liquid";
        }
        if (!s.phase().checked()) {
            return "NOT CHECKED";
        }
        return s.phase().splits() ? "TWO PHASES" : "one phase";
    }

    /** The search summary line: what was searched, what was left out. */
    static String summary(BlendDesigner.Result r) {
        CandidatePool p = r.pool();
        int leftOut = p.leftOut().values().stream().mapToInt(List::size).sum() - p.withoutHansen();
        return String.format(Locale.ROOT, "searched %d of %d library solvents (%d without Hansen parameters, %d left out by the constraints%s); "
                        + "%d subsets, %d solved exactly, the rest ruled out by bounds%s",
                p.free().size(), p.librarySize(), p.withoutHansen(), leftOut, p.fixed().isEmpty() ? "" : ", " + p.fixed().size() + " fixed",
                r.subsets(), r.solved(), (r.droppedTwoPhase() > 0 ? "; " + r.droppedTwoPhase() + " two-phase blends left out (--keep-two-phase shows them)" : "")
                        + (r.droppedFlashPoint() > 0 ? "; " + r.droppedFlashPoint() + " left out: blend flash point below the minimum" : ""));
    }

    static Map<String, Object> json(BlendSuggestion s) {
        RankedBlend b = s.blend();
        Map<String, Object> m = new LinkedHashMap<>();
        List<Map<String, Object>> comps = new ArrayList<>();
        for (BlendComponent c : b.components()) {
            Map<String, Object> cm = new LinkedHashMap<>();
            cm.put("name", c.solvent().name());
            cm.put("fraction", Double.valueOf(BlendSpec.formatFraction(c.fraction())));
            comps.add(cm);
        }
        m.put("components", comps);
        m.put("dD", Output.round(b.point().dD(), 3));
        m.put("dP", Output.round(b.point().dP(), 3));
        m.put("dH", Output.round(b.point().dH(), 3));
        m.put("ra", Output.round(b.ra(), 4));
        m.put("red", Output.round(b.red(), 4));
        m.put("within_red_limit", b.withinLimit());
        if (b.rankBy() != RankBy.RED) {
            m.put("rank_by", b.rankBy().word());
            m.put("secondary", Output.round(b.secondary(), 4));
        }
        Map<String, Object> phase = new LinkedHashMap<>();
        if (s.phase() == null) {
            phase.put("checked", true);
            phase.put("splits", false);
            phase.put("model", null);
            phase.put("detail", "a single liquid cannot split");
        } else {
            phase.put("checked", s.phase().checked());
            phase.put("splits", s.phase().splits());
            phase.put("model", s.phase().model());
            phase.put("detail", s.phase().detail());
        }
        m.put("phase", phase);
        m.put("flash_point_c", s.flashPointC() == null ? null : Output.round(s.flashPointC(), 1));
        m.put("flash_point_basis", s.flashPointBasis());
        m.put("warnings", s.warnings());
        m.put("cautions", s.cautions());
        return m;
    }

    static Map<String, Object> summaryJson(BlendDesigner.Result r) {
        Map<String, Object> m = new LinkedHashMap<>();
        CandidatePool p = r.pool();
        m.put("library_size", p.librarySize());
        m.put("searched", p.free().size());
        m.put("without_hansen", p.withoutHansen());
        Map<String, Object> counts = new LinkedHashMap<>();
        p.leftOut().forEach((reason, names) -> counts.put(reason, names.size()));
        m.put("left_out", counts);
        m.put("without_hansen_names", p.leftOut().getOrDefault(CandidatePool.NO_HANSEN, List.of()));
        m.put("subsets", r.subsets());
        m.put("solved_exactly", r.solved());
        m.put("two_phase_left_out", r.droppedTwoPhase());
        m.put("below_blend_flash_point_left_out", r.droppedFlashPoint());
        return m;
    }

    /** Prints warnings and cautions under a table, one block per rank. */
    static void notes(PrintWriter out, List<BlendSuggestion> list) {
        for (int i = 0; i < list.size(); i++) {
            BlendSuggestion s = list.get(i);
            for (String w : s.warnings()) {
                out.println("#" + (i + 1) + " WARNING: " + w);
            }
            out.println("#" + (i + 1) + " cautions: " + String.join("; ", s.cautions()));
        }
    }

    /** Progress on stderr for long searches (after two seconds, at most every two seconds). */
    public static ProgressListener progress(PrintWriter err) {
        long start = System.nanoTime();
        long[] last = {start};
        return (done, total) -> {
            long now = System.nanoTime();
            if (now - start < 2_000_000_000L) {
                return;
            }
            synchronized (last) {
                if (now - last[0] >= 2_000_000_000L) {
                    last[0] = now;
                    err.printf(Locale.ROOT, "searching… %.0f %% of %d subsets%n", 100.0 * done / Math.max(1, total), total);
                    err.flush();
                }
            }
        };
    }
}
