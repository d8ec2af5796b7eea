package org.cohesa.desktop.structure;

import java.util.List;
import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.Database;
import org.cohesa.store.MaterialRepository;
import org.cohesa.store.StructureEntries;

/**
 * A drug substance (or any small molecule) as the target, from its structure: the centre is the structure
 * estimate ({@link StructureEntries#materialCentre}, the same as {@code materials add --smiles}); the radius is
 * the one the user gives, or the documented default for small-molecule solids with a caution pointing to a fit.
 * "Set as target" only changes the session's target; "Keep as my material" also stores it (one transaction).
 */
public final class StructureTargetForm {

    static final StructureEntries.Fields FIELDS = new StructureEntries.Fields("SMILES", "δD/δP/δH",
            "type the sphere on the Type in tab instead",
            "from dissolving tests on the Fit your tests tab (or 'cohesa fit FILE --prior-smiles SMILES', which starts from this estimate)");

    private final Session session;
    private final StructurePane structure;
    private final TextField name = new TextField();
    private final TextField r0 = new TextField();
    private final Label outcome = new Label();
    private final ScrollPane root;

    public StructureTargetForm(Session session) {
        this.session = session;
        structure = new StructurePane(session.jobs(), "SMILES", 210, 160);
        name.setId("structure-target-name");
        name.setPromptText("e.g. my API, lot 3");
        name.setPrefColumnCount(18);
        r0.setId("structure-target-r0");
        r0.setPromptText("empty: " + StructureEntries.DEFAULT_R0 + " (default)");
        r0.setPrefColumnCount(12);
        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(6);
        Label nameLabel = new Label("Na_me");
        nameLabel.setMnemonicParsing(true);
        nameLabel.setLabelFor(name);
        Label r0Label = new Label("R0 (MPa½)");
        r0Label.setLabelFor(r0);
        form.addRow(0, nameLabel, name);
        form.addRow(1, r0Label, r0);
        Button apply = new Button("Set as _target");
        apply.setId("structure-target-apply");
        apply.setOnAction(e -> apply(false));
        Button keep = new Button("Keep as my _material");
        keep.setId("structure-target-keep");
        keep.setOnAction(e -> apply(true));
        apply.disableProperty().bind(structure.resultProperty().isNull());
        keep.disableProperty().bind(structure.resultProperty().isNull());
        outcome.setId("structure-target-outcome");
        outcome.setWrapText(true);
        outcome.getStyleClass().add("hint");
        Label intro = new Label("A drug substance or other small molecule without a measured sphere: its centre is estimated "
                + "from the structure; the radius cannot be, so give one or take the screening default and measure it later "
                + "with Fit your tests.");
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");
        VBox box = new VBox(8, intro, structure.node(), form, new HBox(8, apply, keep), outcome);
        box.setPadding(new Insets(8));
        box.setId("target-structure");
        root = new ScrollPane(box);
        root.setFitToWidth(true);
        root.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
    }

    public Node node() {
        return root;
    }

    public StructurePane structure() {
        return structure;
    }

    private void apply(boolean keep) {
        try {
            StructurePane.Result r = structure.resultProperty().get();
            String smiles = structure.smilesProperty().get() == null ? "" : structure.smilesProperty().get().strip();
            if (r == null || !smiles.equals(r.estimate().structure().smiles())) {
                throw new InvalidInputException("SMILES", smiles, "press Estimate first: the values shown are for another structure");
            }
            String label = name.getText() == null ? "" : name.getText().strip();
            if (label.isEmpty()) {
                throw new InvalidInputException("Name", label, "give the substance a name");
            }
            StructureEntries.Centre c = StructureEntries.materialCentre(r.estimate(), FIELDS, smiles, null, null, null, radius());
            SolubilitySphere sphere = SolubilitySphere.of(c.dD(), c.dP(), c.dH(), c.r0());
            structure.showProblem(null);
            outcome.setText(String.format(Locale.ROOT, "%s: δD %.1f, δP %.1f, δH %.1f, R0 %.1f MPa½.%n%s", label, c.dD(), c.dP(), c.dH(), c.r0(),
                    String.join("\n", c.lines().stream().filter(l -> l.startsWith("caution: R0")).toList())));
            if (keep) {
                Material m = new Material(label, List.of(), MaterialKind.DRUG, sphere, c.source(), String.join("; ", c.lines()), true);
                session.jobs().run("Saving " + label, p -> {
                    try (Database db = session.openDatabase()) {
                        MaterialRepository repo = new MaterialRepository(db);
                        repo.add(m);
                        return repo.all();
                    }
                }, all -> {
                    session.materials().setAll(all);
                    session.targetProperty().set(new TargetChoice(label, sphere, "your material, " + c.source()));
                    session.jobs().say("Kept \"" + label + "\" as your own material and set it as the target.");
                }, err -> structure.showProblem(err));
            } else {
                session.targetProperty().set(new TargetChoice(label, sphere, c.source()));
                session.jobs().say("Target set from the structure: " + label);
            }
        } catch (RuntimeException ex) {
            structure.showProblem(ErrorText.of(ex));
        }
    }

    private Double radius() {
        String t = r0.getText() == null ? "" : r0.getText().strip();
        if (t.isEmpty()) {
            return null;
        }
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new InvalidInputException("R0", t, "not a number (use a dot as decimal separator)");
        }
        if (!Double.isFinite(v) || v <= 0 || v > 60) {
            throw new InvalidInputException("R0", t, "must be a positive number up to 60 MPa½");
        }
        return v;
    }
}
