package org.cohesa.desktop.cases;

import java.util.List;
import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.VapourExposure;
import org.cohesa.core.solvent.Blend;
import org.cohesa.desktop.blend.CandidateFacts;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.SafetyText;

/**
 * The safety panel of a chosen candidate, laid out as the record's PDF is: badges in words, one table row per component
 * and one for the blend (flash point, GHS category and packing group, exposure limit, ICH Q3C class with its meaning and
 * limit, solvent-guide rank), the hazard statements with their words and carriers, and the cautions as a list that ends
 * by deferring to the SDS. Unknown values say "unknown", never a blank.
 */
public final class SafetyPanel {

    private SafetyPanel() {
    }

    public static Node of(SafetyProfile p, Blend b) {
        VBox box = new VBox(8);
        box.setId("safety-panel");
        box.getStyleClass().add("safety-panel");
        box.getChildren().add(badges(p, b));
        if (p == null) {
            Label none = new Label("No safety profile could be computed for this candidate; read each component's SDS.");
            none.setWrapText(true);
            box.getChildren().add(none);
            return box;
        }
        box.getChildren().add(table(p));
        if (!p.hazardStatements().isEmpty()) {
            box.getChildren().add(section("Hazard statements"));
            VBox h = new VBox(2);
            for (SafetyProfile.HazardLine line : p.hazardStatements()) {
                String carriers = p.isPure() ? "" : " — " + String.join(", ", line.carriers().stream()
                        .map(c -> c.name() + " " + Numbers.plain(c.volumePercent()) + " %").toList());
                Label l = new Label(line.code() + "  " + (line.text() == null ? "(text not in the library)" : line.text()) + carriers);
                l.setWrapText(true);
                h.getChildren().add(l);
            }
            box.getChildren().add(h);
        }
        box.getChildren().add(section("Cautions"));
        VBox cautions = new VBox(3);
        cautions.setId("safety-cautions");
        for (String c : SafetyText.cautions(p)) {
            Label l = new Label("• " + c);
            l.setWrapText(true);
            l.getStyleClass().add("caution-text");
            cautions.getChildren().add(l);
        }
        box.getChildren().add(cautions);
        return box;
    }

    private static Node badges(SafetyProfile p, Blend b) {
        FlowPane f = new FlowPane(6, 4);
        List<CandidateFacts.Badge> list = CandidateFacts.badges(p, b);
        for (CandidateFacts.Badge badge : list) {
            Label l = new Label(severityWord(badge.severity()) + ": " + badge.text());
            l.getStyleClass().addAll("badge", "badge-" + badge.severity().name().toLowerCase(Locale.ROOT));
            l.setTooltip(new javafx.scene.control.Tooltip(badge.detail()));
            f.getChildren().add(l);
        }
        if (list.isEmpty()) {
            Label l = new Label("no CMR, acute-toxicity or sensitiser statement in the library");
            l.getStyleClass().addAll("badge", "badge-info");
            f.getChildren().add(l);
        }
        return f;
    }

    static String severityWord(CandidateFacts.Severity s) {
        return switch (s) {
            case SEVERE -> "severe";
            case NOTABLE -> "take care";
            case INFO -> "note";
        };
    }

    private static Label section(String t) {
        Label l = new Label(t);
        l.getStyleClass().add("section-title");
        return l;
    }

    private static final String[] HEADS = {"Liquid", "Volume", "Flash point", "GHS category · UN packing group", "Exposure limit (TWA)",
        "ICH Q3C class", "Guide rank (CHEM21)"};
    private static final double[] MIN_WIDTH = {120, 74, 86, 104, 108, 150, 122};

    private static GridPane table(SafetyProfile p) {
        GridPane g = new GridPane();
        g.setId("safety-table");
        g.getStyleClass().add("safety-table");
        g.setHgap(0);
        g.setVgap(0);
        for (int i = 0; i < HEADS.length; i++) {
            g.add(cell(HEADS[i], "safety-head"), i, 0);
            ColumnConstraints cc = new ColumnConstraints();
            cc.setHgrow(i == 0 ? Priority.ALWAYS : Priority.SOMETIMES);
            cc.setMinWidth(MIN_WIDTH[i]);
            g.getColumnConstraints().add(cc);
        }
        int row = 1;
        for (SafetyProfile.ComponentInfo c : p.components()) {
            SafetyProfile.IchLine ich = p.ich().stream().filter(l -> l.component().equals(c.name())).findFirst().orElse(null);
            VapourExposure.Component ex = p.exposure().components().stream().filter(x -> x.name().equals(c.name())).findFirst().orElse(null);
            SafetyProfile.GuideLine guide = p.guide().stream().filter(x -> x.component().equals(c.name())).findFirst().orElse(null);
            String[] v = {c.name(), Numbers.plain(c.volumeFraction() * 100) + " %",
                c.flashPointC() == null ? "unknown" : Numbers.plain(c.flashPointC()) + " °C",
                c.flashPointC() == null ? "unknown" : org.cohesa.core.safety.FlammableLiquidClass.ghs(c.flashPointC(), c.boilingPointC()).category() == null
                        ? "not classified" : "category " + org.cohesa.core.safety.FlammableLiquidClass.ghs(c.flashPointC(), c.boilingPointC()).category(),
                exposure(ex), ich(ich), guide == null || guide.scores() == null || guide.scores().rank() == null ? "unknown" : guide.scores().rank().label()};
            for (int i = 0; i < v.length; i++) {
                g.add(cell(v[i], row % 2 == 0 ? "safety-even" : "safety-odd"), i, row);
            }
            row++;
        }
        SafetyProfile.FlashPoint fp = p.flashPoint();
        String flash = switch (fp.status()) {
            case LIBRARY -> Numbers.plain(fp.celsius()) + " °C";
            case COMPUTED -> Numbers.plain(fp.celsius()) + " °C (estimated)";
            case NOT_FLAMMABLE -> "not flammable";
            case NONE_BELOW_BOILING -> "none below boiling";
            case UNKNOWN -> "unknown";
        };
        String[] blend = {p.isPure() ? "the liquid" : "the blend", "100 %", flash,
            (p.ghs().category() == null ? (fp.status() == SafetyProfile.FlashPointStatus.UNKNOWN ? "unknown" : "not classified")
                    : "category " + p.ghs().category()) + (p.packingGroup() == null ? "" : " · PG " + p.packingGroup()),
            exposureIndex(p.exposure()), ich(worst(p.ich())), p.guideRank() == null ? "unknown" : p.guideRank().label()};
        for (int i = 0; i < blend.length; i++) {
            g.add(cell(blend[i], "safety-total"), i, row);
        }
        return g;
    }

    /** The mixture exposure index (saturated vapour ÷ limit, summed); a component without a limit makes it a lower bound. */
    private static String exposureIndex(VapourExposure.Result r) {
        if (r.complete()) {
            return String.format(Locale.ROOT, "index %.2g", r.index());
        }
        return r.index() > 0 ? String.format(Locale.ROOT, "index ≥ %.2g (a component has no limit)", r.index()) : "unknown (no limit known)";
    }

    /** The component with the strictest ICH Q3C class; an unlisted one only when none is listed. */
    private static SafetyProfile.IchLine worst(List<SafetyProfile.IchLine> lines) {
        SafetyProfile.IchLine w = null;
        for (SafetyProfile.IchLine l : lines) {
            if (w == null || w.entry() == null && l.entry() != null
                    || l.entry() != null && w.entry() != null && l.entry().solventClass() < w.entry().solventClass()) {
                w = l;
            }
        }
        return w;
    }

    private static String exposure(VapourExposure.Component ex) {
        if (ex == null || ex.limitPpm() == null) {
            return "none known";
        }
        return Numbers.plain(ex.limitPpm()) + " ppm" + (ex.limitKind() == null ? "" : " " + ex.limitKind())
                + (ex.skin() ? " · skin" : "") + (ex.jurisdiction() == null ? "" : " (" + ex.jurisdiction() + ")");
    }

    private static String ich(SafetyProfile.IchLine l) {
        if (l == null || l.entry() == null) {
            return "not listed (needs justification)";
        }
        String meaning = switch (l.entry().solventClass()) {
            case 1 -> "to be avoided";
            case 2 -> "to be limited";
            default -> "low toxic potential";
        };
        return "class " + l.entry().solventClass() + ", " + meaning + (l.entry().limitPpm() == null ? "" : " · " + Numbers.plain(l.entry().limitPpm()) + " ppm");
    }

    private static Label cell(String text, String style) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.setMaxWidth(Double.MAX_VALUE);
        l.setMaxHeight(Double.MAX_VALUE);
        l.setPadding(new Insets(3, 6, 3, 6));
        l.getStyleClass().addAll("safety-cell", style);
        return l;
    }
}
