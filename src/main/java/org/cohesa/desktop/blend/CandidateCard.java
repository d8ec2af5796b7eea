package org.cohesa.desktop.blend;

import java.util.List;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.scene.shape.Line;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.desktop.common.Numbers;

/**
 * One candidate as a card: its components with their fractions in full (wrapping, never cut), RED as a bar with the
 * sphere surface marked, flash point and GHS category, the strictest ICH class with its meaning, health badges in
 * words, cost, the phase test and the reason for its rank.
 */
final class CandidateCard {

    /** The RED bar's scale: 0 to this value; the sphere surface (RED 1) sits at two thirds. */
    static final double BAR_MAX_RED = 1.5;
    static final double BAR_WIDTH = 150;

    private CandidateCard() {
    }

    /** @param width the width the card may take (the list's); the component and fact lines wrap inside it */
    static VBox of(BlendModel.Row r, javafx.beans.value.ObservableDoubleValue width) {
        Label rank = new Label(String.valueOf(r.rank()));
        rank.getStyleClass().add("card-rank");
        rank.setMinWidth(Region.USE_PREF_SIZE);
        FlowPane parts = new FlowPane(6, 4);
        parts.getStyleClass().add("card-components");
        for (BlendComponent c : r.blend().components()) {
            if (!parts.getChildren().isEmpty()) {
                Label plus = new Label("+");
                plus.getStyleClass().add("card-plus");
                parts.getChildren().add(plus);
            }
            Label chip = new Label(CandidateFacts.component(c));
            chip.getStyleClass().add("card-component");
            chip.setMinWidth(Region.USE_PREF_SIZE); // a name is wrapped to the next line as a whole, never shortened
            parts.getChildren().add(chip);
        }
        parts.getChildren().add(phase(r));
        HBox head = new HBox(10, rank, parts);
        head.setAlignment(Pos.TOP_LEFT);
        HBox.setHgrow(parts, javafx.scene.layout.Priority.ALWAYS);

        FlowPane facts = new FlowPane(14, 4);
        facts.getStyleClass().add("card-facts");
        facts.getChildren().addAll(redBar(r.suggestion().blend().red()),
                fact(CandidateFacts.flash(r.safety(), r.blend()), "card-flash"),
                fact(CandidateFacts.worstIch(r.blend()), "card-ich"),
                fact(CandidateFacts.cost(r.blend()), "card-cost"));
        FlowPane badges = new FlowPane(6, 4);
        badges.getStyleClass().add("card-badges");
        List<CandidateFacts.Badge> list = CandidateFacts.badges(r.safety(), r.blend());
        for (CandidateFacts.Badge b : list) {
            Label l = new Label(b.text());
            l.getStyleClass().addAll("badge", "badge-" + b.severity().name().toLowerCase(java.util.Locale.ROOT));
            l.setMinWidth(Region.USE_PREF_SIZE);
            l.setTooltip(new Tooltip(b.detail()));
            badges.getChildren().add(l);
        }
        if (list.isEmpty()) {
            Label none = new Label("no CMR or serious health hazard listed");
            none.getStyleClass().addAll("badge", "badge-info");
            badges.getChildren().add(none);
        }
        VBox card = new VBox(5, head, facts, badges);
        javafx.beans.binding.DoubleBinding inner = javafx.beans.binding.Bindings.createDoubleBinding(
                () -> Math.max(200, width.get() - 34), width);
        card.prefWidthProperty().bind(inner);
        card.maxWidthProperty().bind(inner);
        parts.prefWrapLengthProperty().bind(inner.subtract(50));
        facts.prefWrapLengthProperty().bind(inner.subtract(24));
        badges.prefWrapLengthProperty().bind(inner.subtract(24));
        String why = Reasons.of(r);
        if (!why.isEmpty()) {
            Label reason = new Label("Why here: " + why);
            reason.getStyleClass().add("card-why");
            reason.setWrapText(true);
            card.getChildren().add(reason);
        }
        for (String w : r.suggestion().warnings()) {
            Label warn = new Label("⚠ " + w);
            warn.getStyleClass().add("card-warning");
            warn.setWrapText(true);
            card.getChildren().add(warn);
        }
        card.getStyleClass().add("candidate-card");
        card.setPadding(new Insets(8, 10, 8, 10));
        return card;
    }

    private static Label phase(BlendModel.Row r) {
        String text = BlendView.phaseText(r);
        Label l = new Label(text);
        l.getStyleClass().addAll("badge", text.equals("SPLITS") ? "badge-severe" : "badge-info");
        l.setMinWidth(Region.USE_PREF_SIZE);
        return l;
    }

    private static Label fact(String text, String id) {
        Label l = new Label(text);
        l.getStyleClass().addAll("card-fact", id);
        l.setWrapText(true);
        l.setMinWidth(Region.USE_PREF_SIZE);
        return l;
    }

    /** RED as a bar against the sphere surface (RED 1, the tick), with the number beside it. */
    static Node redBar(double red) {
        Pane track = new Pane();
        track.getStyleClass().add("red-track");
        track.setPrefSize(BAR_WIDTH, 10);
        track.setMinSize(BAR_WIDTH, 10);
        track.setMaxSize(BAR_WIDTH, 10);
        Region fill = new Region();
        fill.getStyleClass().addAll("red-fill", red < 1 ? "red-inside" : "red-outside");
        fill.resize(Math.min(1, red / BAR_MAX_RED) * BAR_WIDTH, 10);
        fill.setPrefSize(Math.min(1, red / BAR_MAX_RED) * BAR_WIDTH, 10);
        double at = BAR_WIDTH / BAR_MAX_RED;
        Line surface = new Line(at, -2, at, 12);
        surface.getStyleClass().add("red-surface");
        track.getChildren().addAll(fill, surface);
        Label value = new Label("RED " + Numbers.two(red) + (red < 1 ? " inside" : " outside"));
        value.getStyleClass().add("card-red");
        value.setMinWidth(Region.USE_PREF_SIZE);
        HBox box = new HBox(6, new StackPane(track), value);
        box.setAlignment(Pos.CENTER_LEFT);
        box.setId("red-bar");
        return box;
    }
}
