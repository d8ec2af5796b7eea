package org.cohesa.cli.blend;

import org.cohesa.cli.Output;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.Desirability;
import org.cohesa.core.blend.HazardLimit;
import org.cohesa.core.blend.ReactiveFlag;
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
            case DESIRABILITY -> "score";
            case RED -> null;
            case HAZARD -> "hazard score";
            case COST -> "price/L";
            case COMPONENTS -> "components";
            case EVAPORATION -> "p* 25 °C kPa";
        };
    }

    static String secondaryText(RankedBlend b) {
        return switch (b.rankBy()) {
            case DESIRABILITY -> Output.fmt(b.secondary(), 2);
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
        return (s.phase().splits() ? "TWO PHASES" : "one phase") + (s.phase().basis() == null ? "" : " (" + s.phase().basis().replace("measured with water, model elsewhere", "measured + model") + ")");
    }

    /** The search summary line: what was searched, what was left out. */
    static String summary(BlendDesigner.Result r) {
        CandidatePool p = r.pool();
        int leftOut = p.leftOut().values().stream().mapToInt(List::size).sum() - p.withoutHansen();
        return String.format(Locale.ROOT, "searched %d of %d library solvents (%d without Hansen parameters, %d left out by the constraints%s); "
                        + "%d subsets, %d solved exactly, the rest ruled out by bounds%s",
                p.free().size(), p.librarySize(), p.withoutHansen(), leftOut, p.fixed().isEmpty() ? "" : ", " + p.fixed().size() + " fixed",
                r.subsets(), r.solved(), (r.droppedTwoPhase() > 0 ? "; " + r.droppedTwoPhase() + " two-phase blends left out (--keep-two-phase shows them)" : "")
                        + (r.droppedFlashPoint() > 0 ? "; " + r.droppedFlashPoint() + " left out: blend flash point below the minimum" : "")
                        + (r.droppedBoiling() > 0 ? "; " + r.droppedBoiling() + " left out: blend initial boiling point outside the window or unknown" : "")
                        + (r.droppedWater() > 0 ? "; " + r.droppedWater() + " left out: not " + "as demanded with water" : ""));
    }

    /** One line per safety-first default that left something out, with the option that brings it back. */
    static List<String> defaultsText(CandidatePool p) {
        List<String> out = new ArrayList<>();
        for (BlendReport.Default d : BlendReport.defaults(p)) {
            out.add("left out by the safety defaults, " + d.reason() + ": " + String.join(", ", d.names()) + " (" + d.broughtBackBy() + " brings them back)");
        }
        return out;
    }

    /** Lines saying which limits were applied to what (component or computed blend property). */
    static List<String> appliedLimits(BlendConstraints c) {
        List<String> out = new ArrayList<>();
        if (c.minFlashPointC() != null) {
            out.add("flash point ≥ " + Output.fmt(c.minFlashPointC(), 0) + " °C applied to each component (library, closed cup) and to the blend's computed flash point (Liaw et al. 2002)");
        }
        if (c.more().minBlendFlashPointC() != null) {
            out.add("flash point ≥ " + Output.fmt(c.more().minBlendFlashPointC(), 0) + " °C applied to the blend's computed flash point only (Liaw et al. 2002); components may be lower");
        }
        if (c.boilingMinC() != null || c.boilingMaxC() != null) {
            out.add("boiling point " + window(c.boilingMinC(), c.boilingMaxC()) + " °C applied to each component's normal boiling point");
        }
        if (c.more().blendBoilingMinC() != null || c.more().blendBoilingMaxC() != null) {
            out.add("initial boiling point " + window(c.more().blendBoilingMinC(), c.more().blendBoilingMaxC())
                    + " °C applied to the blend's computed bubble point (blends where it cannot be computed are left out)");
        }
        if (c.maxIchClass() != null) {
            out.add("ICH Q3C class " + c.maxIchClass() + (c.maxIchClass() < 3 ? " or milder" : "") + "; solvents ICH Q3C does not list: "
                    + (c.more().ichUnlistedAllowed() ? "kept (each needs a justification under Q3C)" : "left out (--ich-unlisted keep lets them through; each needs a justification under Q3C)"));
        }
        for (HazardLimit h : c.more().healthLimits()) {
            out.add("replaced for " + h.kind() + " (" + h.because() + "): no candidate carries the same or a worse statement of that kind");
        }
        if (c.more().withWater() != null) {
            out.add("with water: " + (c.more().withWater() == org.cohesa.core.blend.WaterCheck.Need.IMMISCIBLE
                    ? "immiscible — two liquid phases at 1:1 by volume" : "miscible — one liquid phase at every water content from 2 to 98 % by volume")
                    + ", judged from published mutual solubilities (solvent-db/water-miscibility.csv) where they exist and the UNIFAC LLE model elsewhere; each suggestion's why says which");
        }
        for (org.cohesa.core.blend.SoluteCharacter sc : c.more().solute()) {
            out.add("the material is " + sc.word() + " by its structure: " + sc.clash().label() + " solvents left out, " + sc.why()
                    + " (--allow-salt-formers keeps them)");
        }
        if (!c.more().excludeReactive().isEmpty()) {
            out.add("reactive solvents left out: " + c.more().excludeReactive().stream().sorted().map(ReactiveFlag::label).collect(Collectors.joining(", ")));
        }
        return out;
    }

    private static String window(Double lo, Double hi) {
        return (lo == null ? "" : Output.fmt(lo, 0)) + ".." + (hi == null ? "" : Output.fmt(hi, 0));
    }

    /** The one line saying cost could not weigh, or null. */
    static String costNote(BlendOptions o, BlendDesigner.Result r) {
        if (o.costAsked() && Double.isNaN(r.referencePrice())) {
            return "no searched solvent has a price yet, so cost did not weigh in the ranking: set prices with 'cohesa solvents price NAME PRICE' (any currency)";
        }
        return null;
    }

    /** Prints the lines above a table: defaults, limits, cost note. */
    static void header(PrintWriter out, BlendDesigner.Result r, BlendConstraints c, BlendOptions o, Desirability.Weights w) {
        defaultsText(r.pool()).forEach(out::println);
        o.appliedLimits(c).forEach(out::println);
        String cost = costNote(o, r);
        if (cost != null) {
            out.println(cost);
        }
        if (o.rankBy() == RankBy.DESIRABILITY) {
            out.println("ranked by desirability (" + o.preferWord() + ": " + w.describe() + "; RED ≤ " + Output.fmt(o.redLimit(), 2)
                    + " qualifies; docs/methods.md) — --rank-by red gives the closest blends first");
        }
    }

    /** Prints reasons, warnings, flags, variants and cautions under a table, one block per rank. */
    static void notes(PrintWriter out, List<BlendSuggestion> list, boolean all) {
        for (int i = 0; i < list.size(); i++) {
            BlendSuggestion s = list.get(i);
            out.println("#" + (i + 1) + " why: " + String.join("; ", s.why()));
            if (!s.flags().isEmpty()) {
                out.println("#" + (i + 1) + " reactive: " + String.join("; ", s.flags()) + " (--exclude-reactive leaves such solvents out)");
            }
            if (!s.variants().isEmpty()) {
                if (all) {
                    for (RankedBlend v : s.variants()) {
                        out.println("#" + (i + 1) + " variant: " + describe(v) + ", RED " + Output.fmt(v.red(), 3));
                    }
                } else {
                    out.println("#" + (i + 1) + " " + s.variants().size() + " near-duplicate" + (s.variants().size() == 1 ? "" : "s") + " folded under it (--all shows them)");
                }
            }
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
