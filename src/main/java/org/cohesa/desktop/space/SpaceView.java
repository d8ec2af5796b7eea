package org.cohesa.desktop.space;

import java.nio.file.Path;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.shape.Circle;
import org.cohesa.desktop.Snapshots;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Palette;

/**
 * The "Space" screen: the 3D view and the 2D views of the same points (three projections and the Teas
 * triangle) in tabs, one colouring control, one legend, and PNG export of whichever view is showing.
 */
public final class SpaceView {

    private final SpaceModel model;
    private final BorderPane root = new BorderPane();
    private final Space3DView view3d;
    private final TabPane views = new TabPane();
    private final FlowPane legend = new FlowPane(16, 6);

    public SpaceView(SpaceModel model) {
        this.model = model;
        root.setId("space-screen");
        view3d = new Space3DView(model);
        ProjectionPlot ph = new ProjectionPlot(model, ProjectionPlot.Plane.P_H);
        ProjectionPlot dp = new ProjectionPlot(model, ProjectionPlot.Plane.D_P);
        ProjectionPlot dh = new ProjectionPlot(model, ProjectionPlot.Plane.D_H);
        TeasPlot teas = new TeasPlot(model);
        views.getTabs().addAll(tab("3D", "view-3d", view3d.node()), tab(ph), tab(dp), tab(dh),
                tab("Teas triangle", "view-teas", teas.node()));
        views.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        views.setId("space-views");

        ComboBox<Colouring> colourBy = new ComboBox<>();
        colourBy.setId("colour-by");
        colourBy.getItems().setAll(Colouring.values());
        colourBy.valueProperty().bindBidirectional(model.colouringProperty());
        Label colourLabel = new Label("_Colour by");
        colourLabel.setMnemonicParsing(true);
        colourLabel.setLabelFor(colourBy);
        CheckBox doubled = new CheckBox("_Double the δD axis (round spheres)");
        doubled.setId("doubled-dd");
        doubled.selectedProperty().bindBidirectional(model.doubledDdProperty());
        Button reset = new Button("_Reset view");
        reset.setId("reset-view");
        reset.setOnAction(e -> view3d.resetView());
        reset.disableProperty().bind(views.getSelectionModel().selectedIndexProperty().isNotEqualTo(0));
        Button png = new Button("Save view as _PNG…");
        png.setId("save-png");
        png.setOnAction(e -> savePng());
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        Label help = new Label("Drag: rotate · wheel: zoom · right- or shift-drag: pan · click a point: select it");
        help.getStyleClass().add("hint");
        ComboBox<Space3DView.Framing> frame = new ComboBox<>();
        frame.setId("space3d-framing");
        frame.getItems().setAll(Space3DView.Framing.values());
        frame.valueProperty().bindBidirectional(view3d.framingProperty());
        frame.setTooltip(new javafx.scene.control.Tooltip("What the 3D picture is scaled to: the liquids near the target "
                + "(RED ≤ 2, with the selected blend), or every liquid (water alone then sets the height)"));
        Label frameLabel = new Label("_Frame");
        frameLabel.setMnemonicParsing(true);
        frameLabel.setLabelFor(frame);
        HBox bar = new HBox(10, colourLabel, colourBy, doubled, frameLabel, frame, grow, reset, png);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(8, 10, 8, 10));
        bar.getStyleClass().add("toolbar-strip");
        legend.setId("legend");
        legend.setPadding(new Insets(6, 10, 6, 10));
        legend.getStyleClass().add("legend");
        model.colouringProperty().addListener((o, a, b) -> fillLegend());
        fillLegend();
        HBox bottom = new HBox(12, legend, help);
        HBox.setHgrow(legend, Priority.ALWAYS);
        bottom.setAlignment(Pos.CENTER_LEFT);
        bottom.setPadding(new Insets(0, 10, 0, 0));
        root.setTop(bar);
        root.setCenter(views);
        root.setBottom(bottom);
    }

    public Node node() {
        return root;
    }

    public Space3DView view3d() {
        return view3d;
    }

    /** Shows one of the views: 0 = 3D, 1 = δP–δH, 2 = δD–δP, 3 = δD–δH, 4 = Teas. */
    public void showView(int index) {
        views.getSelectionModel().select(index);
    }

    private void fillLegend() {
        legend.getChildren().clear();
        for (Colouring.Category c : model.colouringProperty().get().categories()) {
            Circle dot = new Circle(6, c.colour());
            dot.setStroke(Palette.INK);
            Label l = new Label(c.label(), dot);
            l.getStyleClass().add("legend-entry");
            legend.getChildren().add(l);
        }
        Circle ring = new Circle(6, javafx.scene.paint.Color.TRANSPARENT);
        ring.setStroke(Palette.TARGET);
        ring.setStrokeWidth(1.6);
        Label target = new Label("target (sphere outline)", ring);
        target.getStyleClass().add("legend-entry");
        legend.getChildren().add(target);
    }

    private void savePng() {
        Tab t = views.getSelectionModel().getSelectedItem();
        Path file = Dialogs.saveFile(root, "Save the view as PNG", "cohesa-" + t.getId() + ".png", "PNG image", "*.png");
        if (file == null) {
            return;
        }
        try {
            Snapshots.savePng(t.getContent().snapshot(null, null), file);
            model.session().jobs().say("Saved " + file);
        } catch (RuntimeException ex) {
            model.session().jobs().complain(ErrorText.of(ex));
        }
    }

    private static Tab tab(String title, String id, Node content) {
        Tab t = new Tab(title, content);
        t.setId(id);
        return t;
    }

    private static Tab tab(ProjectionPlot p) {
        String id = p.node().getId();
        String title = switch (id) {
            case "projection-p-h" -> "δP–δH";
            case "projection-d-p" -> "δD–δP";
            default -> "δD–δH";
        };
        return tab(title, "view-" + id.substring("projection-".length()), p.node());
    }
}
