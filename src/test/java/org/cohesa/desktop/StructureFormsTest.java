package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TabPane;
import javafx.scene.control.TextField;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.stage.Stage;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.desktop.library.SolventEditor;
import org.cohesa.desktop.structure.StructurePane;
import org.cohesa.store.StructureEntries;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The structure part of the desktop as a user meets it: a SMILES in the add-solvent form and on the target screen,
 * the estimate with route, error and drawing, one-line refusals that store nothing. The estimates themselves are
 * checked against the published tables in the core tests (HansenEstimateTest, UnifacGroupsTest); here the forms
 * must store exactly what the command line stores for the same input ({@link StructureEntries}).
 *
 * <p>With {@code -Dcohesa.screenshots=DIR} (under Xvfb, {@code -Pxvfb}) it also writes the screenshots in DIR.
 */
@ExtendWith(ApplicationExtension.class)
class StructureFormsTest {

    /** Ethyl levulinate, a bio-based ester-ketone solvent (structure: PubChem CID 10883). */
    private static final String ETHYL_LEVULINATE = "CCOC(=O)CCC(C)=O";
    /** Ibuprofen (PubChem CID 3672): a drug substance with no sphere in the library. */
    private static final String IBUPROFEN = "CC(C)Cc1ccc(cc1)C(C)C(=O)O";

    /** One database for the class: the bundled table is imported once (each test uses names of its own). */
    private static Path shared;
    private DesktopFixture fx;
    private Stage stage;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-structure-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    @Test
    void theSolventFormEstimatesFromASmilesDrawsItAndStoresWhatTheCommandLineWould(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        SolventEditor ed = openEditor(robot);
        robot.interact(() -> {
            ed.field("name").setText("ethyl levulinate (my lot)");
            ed.field("boiling_point_c").setText("206");
            ed.structure().smilesProperty().set(ETHYL_LEVULINATE);
            ed.structure().estimate();
        });
        fx.awaitJobs();
        StructurePane.Result r = ed.structure().resultProperty().get();
        assertNotNull(r, "the estimate is shown");
        assertNotNull(r.drawing(), "the structure is drawn: " + r.drawingProblem());
        assertTrue(inkPixels(r.drawing()) > 300, "the drawing has lines and labels, not a blank frame");

        Map<String, String> expected = new LinkedHashMap<>(Map.of("name", "ethyl levulinate (my lot)"));
        StructureEstimate e = StructureEntries.estimate("SMILES", ETHYL_LEVULINATE, MeasuredProperties.NONE);
        StructureEntries.fillSolventRow(expected, e, new StructureEntries.Fields("SMILES", "δD/δP/δH", "", ""), ETHYL_LEVULINATE);
        assertEquals(expected.get("dD"), ed.field("dD").getText());
        assertEquals(expected.get("dP"), ed.field("dP").getText());
        assertEquals(expected.get("dH"), ed.field("dH").getText());
        assertEquals(expected.get("molar_volume"), ed.field("molar_volume").getText());
        assertEquals("C7H12O3", ed.field("formula").getText());
        assertTrue(ed.field("dD").getStyleClass().contains("field-estimated"), "an estimated field is marked");
        assertFalse(ed.field("boiling_point_c").getStyleClass().contains("field-estimated"), "a typed value is not");
        String shown = text(ed, "#structure-values");
        assertTrue(shown.contains("mean of Mathieu 2018 and Stefanis–Panayiotou"), "the route is named: " + shown);
        assertTrue(shown.contains(String.format(java.util.Locale.ROOT, "± %.1f", e.dD().expectedMae()))
                && shown.contains(String.format(java.util.Locale.ROOT, "± %.1f", e.dP().expectedMae()))
                && shown.contains(String.format(java.util.Locale.ROOT, "± %.1f", e.dH().expectedMae())), "the expected errors are shown: " + shown);
        assertTrue(text(ed, "#structure-groups").contains("CH3"), text(ed, "#structure-groups"));
        // both group methods' own values are shown beside the combined ones
        String methods = ((Label) ed.dialog().getDialogPane().lookup("#structure-methods")).getText();
        assertTrue(methods.contains("Mathieu 2018: δD " + String.format(java.util.Locale.ROOT, "%.1f", e.groupMethods().get(0).dD()))
                && methods.contains("Stefanis–Panayiotou 2008/2012: δD"), methods);

        shoot(robot, ed.dialog().getDialogPane(), "structure-solvent-form");
        robot.interact(() -> ed.field("dP").setText(ed.field("dP").getText()));
        assertTrue(ed.field("dP").getStyleClass().contains("field-estimated"), "the estimate's own value keeps its outline");
        boolean[] ok = new boolean[1];
        robot.interact(() -> ok[0] = ed.validate());
        assertTrue(ok[0]);
        Solvent s = ed.result();
        robot.interact(() -> {
            ed.dialog().close();
            fx.workbench.libraryModel().add(s, null);
        });
        fx.awaitJobs();
        fx.awaitJobs();
        Solvent stored = find("ethyl levulinate (my lot)");
        assertNotNull(stored, "stored in the library");
        assertEquals(ETHYL_LEVULINATE, stored.smiles());
        assertEquals(expected.get("unifac_groups"), stored.unifac().format(), "UNIFAC groups from the structure are kept");
        assertEquals(StructureEntries.HSP_SOURCE, stored.sources().get("hsp"));
        assertEquals(206.0, stored.boilingPointC(), 1e-9);
        assertTrue(stored.note().contains("expected error"), stored.note());

        SolventEditor edit = openEditor(robot, stored);
        fx.awaitJobs();
        assertNotNull(edit.structure().resultProperty().get(), "editing an entry with a structure shows it at once");
        assertNotNull(edit.structure().resultProperty().get().drawing());
        assertEquals(Double.parseDouble(expected.get("dD")), Double.parseDouble(edit.field("dD").getText()), 1e-9,
                "showing the stored structure changes no field");
        assertFalse(edit.field("dD").getStyleClass().contains("field-estimated"));
        robot.interact(() -> ok[0] = edit.validate());
        assertTrue(ok[0], "an unchanged stored structure needs no new estimate");
        robot.interact(() -> edit.dialog().close());
    }

    @Test
    void aBadStructureGetsOneLineNamingTheFieldAndNothingIsStored(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        int before = fx.session.solvents().size();
        SolventEditor ed = openEditor(robot);
        for (String[] bad : new String[][] {{"C1CC", "not a valid SMILES"}, {"[Na+].[Cl-]", "several components"},
            {"C[CH2]", "open-shell"}, {"CC[Sn](C)(C)C", "metal Sn"}}) {
            robot.interact(() -> {
                ed.structure().smilesProperty().set(bad[0]);
                ed.structure().estimate();
            });
            fx.awaitJobs();
            String line = text(ed, "#structure-problem");
            assertTrue(line.startsWith("SMILES '" + bad[0] + "': ") && line.contains(bad[1]), line);
            assertFalse(line.contains("\n"), "one line");
            assertNull(ed.structure().resultProperty().get());
        }
        shoot(robot, ed.dialog().getDialogPane(), "structure-solvent-refused");
        boolean[] ok = new boolean[1];
        robot.interact(() -> {
            ed.field("name").setText("should not be stored");
            ok[0] = ed.validate();
        });
        assertFalse(ok[0], "a SMILES that was refused cannot be saved");
        robot.interact(() -> ed.dialog().close());
        assertEquals(before, fx.session.solvents().size());
        assertNull(find("should not be stored"));
    }

    @Test
    void aFamilyTheMethodHandlesBadlyIsFlaggedAndAPartialHansenEntryIsRefused(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        SolventEditor ed = openEditor(robot);
        robot.interact(() -> {
            ed.field("name").setText("my amide");
            ed.field("dD").setText("17.4");
            ed.structure().smilesProperty().set("CN(C)C(C)=O"); // N,N-dimethylacetamide
            ed.structure().estimate();
        });
        fx.awaitJobs();
        String cautions = text(ed, "#structure-cautions");
        assertTrue(cautions.contains("amide structures are estimated much less well"), cautions);
        assertTrue(text(ed, "#structure-problem").startsWith("δD/δP/δH 'CN(C)C(C)=O': give all three"), text(ed, "#structure-problem"));
        assertEquals("", ed.field("dP").getText(), "nothing filled when one component was typed alone");
        robot.interact(() -> ed.dialog().close());
    }

    @Test
    void aChangedSmilesMustBeEstimatedAgainBeforeSaving(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        SolventEditor ed = openEditor(robot);
        robot.interact(() -> {
            ed.field("name").setText("stale entry");
            ed.structure().smilesProperty().set("CCCCO");
            ed.structure().estimate();
        });
        fx.awaitJobs();
        StructureEstimate butanol = StructureEntries.estimate("SMILES", "CCCCO", MeasuredProperties.NONE);
        assertEquals(String.format(java.util.Locale.ROOT, "%.1f", butanol.dH().value()), ed.field("dH").getText());
        boolean[] ok = new boolean[1];
        robot.interact(() -> {
            ed.structure().smilesProperty().set("CCCCCCCCO");
            ok[0] = ed.validate();
        });
        assertFalse(ok[0]);
        assertTrue(text(ed, "#editor-problems").contains("SMILES 'CCCCCCCCO': press Estimate"), text(ed, "#editor-problems"));
        robot.interact(() -> ed.structure().estimate());
        fx.awaitJobs();
        StructureEstimate octanol = StructureEntries.estimate("SMILES", "CCCCCCCCO", MeasuredProperties.NONE);
        assertEquals(String.format(java.util.Locale.ROOT, "%.1f", octanol.dH().value()), ed.field("dH").getText(),
                "the fields hold the new structure's estimate, not the old one's");
        robot.interact(() -> ok[0] = ed.validate());
        assertTrue(ok[0]);
        assertEquals("CCCCCCCCO", ed.result().smiles());
        assertEquals(StructureEntries.HSP_SOURCE, ed.result().sources().get("hsp"));
        robot.interact(() -> {
            // a measured value typed over the estimate (one that differs from it)
            ed.field("dD").setText(String.format(java.util.Locale.ROOT, "%.1f", octanol.dD().value() + 0.4));
            ok[0] = ed.validate();
        });
        assertFalse(ed.field("dD").getStyleClass().contains("field-estimated"), "a typed-over value loses the estimate's outline");
        assertTrue(ok[0]);
        assertEquals("user", ed.result().sources().get("hsp"), "the Hansen values are no longer the estimate's alone");
        robot.interact(() -> ed.dialog().close());
    }

    @Test
    void aDrugSubstanceBecomesTheTargetFromItsStructureAndCanBeKept(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.show(Screen.TARGET);
            robot.lookup("#target-ways").queryAs(TabPane.class).getSelectionModel().select(2);
        });
        Parent form = robot.lookup("#target-structure").queryAs(Parent.class);
        TextField smiles = (TextField) form.lookup("#structure-smiles");
        robot.interact(() -> {
            ((TextField) form.lookup("#structure-target-name")).setText("ibuprofen (estimated)");
            smiles.setText(IBUPROFEN);
            ((Button) form.lookup("#structure-estimate")).fire();
        });
        fx.awaitJobs();
        ImageView drawing = (ImageView) form.lookup("#structure-drawing");
        assertNotNull(drawing.getImage());
        // ibuprofen is an acid: on the default group route acids are no much-worse family (docs/methods.md), so the
        // caution shown is the screening one every estimate carries
        assertTrue(((Label) form.lookup("#structure-cautions").lookup(".label")).getText().contains("screening values"),
                ((Label) form.lookup("#structure-cautions").lookup(".label")).getText());
        robot.interact(() -> ((Button) form.lookup("#structure-target-apply")).fire());
        StructureEstimate e = StructureEntries.estimate("SMILES", IBUPROFEN, MeasuredProperties.NONE);
        StructureEntries.Centre c = StructureEntries.materialCentre(e, new StructureEntries.Fields("SMILES", "", "", ""), IBUPROFEN,
                null, null, null, null);
        var target = fx.session.target();
        assertEquals("ibuprofen (estimated)", target.name());
        assertEquals(c.dD(), target.sphere().centre().dD(), 1e-9);
        assertEquals(c.dP(), target.sphere().centre().dP(), 1e-9);
        assertEquals(c.dH(), target.sphere().centre().dH(), 1e-9);
        assertEquals(StructureEntries.DEFAULT_R0, target.sphere().r0(), 1e-9, "no radius given: the documented default");
        assertTrue(((Label) form.lookup("#structure-target-outcome")).getText().contains("caution: R0 7.0 is a default"));
        WaitForAsyncUtils.waitForFxEvents();
        shoot(robot, stage.getScene().getRoot(), "structure-target");
        shootNode(robot, form, "structure-target-form");

        robot.interact(() -> {
            ((TextField) form.lookup("#structure-target-r0")).setText("-3");
            ((Button) form.lookup("#structure-target-keep")).fire();
        });
        assertEquals("R0 '-3': must be a positive number up to 60 MPa½", ((Label) form.lookup("#structure-problem")).getText());
        int materials = fx.session.materials().size();
        robot.interact(() -> {
            ((TextField) form.lookup("#structure-target-r0")).setText("6.5");
            ((Button) form.lookup("#structure-target-keep")).fire();
        });
        fx.awaitJobs();
        assertEquals(materials + 1, fx.session.materials().size());
        Material m = fx.session.materials().stream().filter(x -> x.name().equals("ibuprofen (estimated)")).findFirst().orElseThrow();
        assertTrue(m.userEntry());
        assertEquals(MaterialKind.DRUG, m.kind());
        assertEquals(6.5, m.sphere().r0(), 1e-9);
        assertTrue(m.source().contains("estimated from the structure"), m.source());
    }

    @Test
    void measuredPropertiesMoveValuesToThePropertyRouteWithTheirErrorsAndBadOnesAreRefused(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // Dimethyl sulfoxide: the group method has no polar increment for S=O, so δP needs the dipole moment.
        // ρ 1.100 g/cm³, n_D 1.4793, μ 3.96 D, ΔHvap(298 K) 52.9 kJ/mol (CRC Handbook; from memory);
        // published (18.4, 16.4, 10.2) MPa½ (Hansen handbook 2007, table A.1; from memory).
        String dmso = "CS(C)=O";
        SolventEditor ed = openEditor(robot);
        robot.interact(() -> {
            ed.field("name").setText("DMSO (my lot)");
            ed.structure().smilesProperty().set(dmso);
            ed.structure().estimate();
        });
        fx.awaitJobs();
        assertTrue(text(ed, "#structure-values").contains("not covered by the method"), "without μ the group method gives no δP");
        assertTrue(text(ed, "#structure-problem").startsWith("SMILES 'CS(C)=O'"), "and the entry cannot be filled: " + text(ed, "#structure-problem"));
        assertFalse(ed.structure().measuredField("density").getParent().isVisible(), "the library form's own density field is the one used");

        // each measured field is checked at the boundary: one line naming the field and the value, the field outlined
        for (String[] bad : new String[][] {{"refractive-index", "2.5", "Refractive index n_D '2.5': must lie between 1.2 and 1.9"},
            {"dipole", "3,96", "Dipole moment (D) '3,96': not a number"}, {"hvap", "-4", "ΔHvap at 25 °C (kJ/mol) '-4': must lie between 5 and 200"}}) {
            robot.interact(() -> {
                ed.structure().measuredField(bad[0]).setText(bad[1]);
                ed.structure().estimate();
            });
            fx.awaitJobs();
            String line = text(ed, "#structure-problem");
            assertTrue(line.startsWith(bad[2]), line);
            assertFalse(line.contains("\n"), "one line");
            assertNull(ed.structure().resultProperty().get(), "nothing estimated from a bad value");
            assertTrue(ed.structure().measuredField(bad[0]).getStyleClass().contains("field-error"), bad[0] + " is outlined");
            robot.interact(() -> ed.structure().measuredField(bad[0]).setText(""));
            assertFalse(ed.structure().measuredField(bad[0]).getStyleClass().contains("field-error"), "the outline goes with the bad text");
        }

        robot.interact(() -> {
            ed.field("density").setText("1.100");
            ed.structure().measuredField("refractive-index").setText("1.4793");
            ed.structure().measuredField("dipole").setText("3.96");
            ed.structure().measuredField("hvap").setText("52.9");
            ed.structure().estimate();
        });
        fx.awaitJobs();
        MeasuredProperties measured = new MeasuredProperties(1.100, 1.4793, 3.96, 52.9);
        StructureEstimate e = StructureEntries.estimate("SMILES", dmso, measured);
        String shown = text(ed, "#structure-values");
        assertTrue(shown.contains("refractive index via molar refraction") && shown.contains("dipole moment (Hansen–Beerbower)")
                && shown.contains("molar mass / given density") && shown.contains("enthalpy of vaporisation"), "every route is named: " + shown);
        assertTrue(shown.contains("± 0.7") && shown.contains("± 1.0") && shown.contains("± 0.6"),
                "the property routes' errors (δD 0.65, δP 1.01, δt 0.60) are shown: " + shown);
        assertEquals(String.format(java.util.Locale.ROOT, "%.1f", e.dP().value()), ed.field("dP").getText(), "δP filled from μ, as the core gives it");
        assertEquals(String.format(java.util.Locale.ROOT, "%.1f", e.dD().value()), ed.field("dD").getText());
        assertTrue(Math.abs(e.dP().value() - 16.4) <= 2.19, "δP within the route's P90 (2.19) of the published 16.4: " + e.dP().value());
        assertTrue(Math.abs(e.dD().value() - 18.4) <= 1.37, "δD within the route's P90 (1.37) of the published 18.4: " + e.dD().value());
        assertTrue(text(ed, "#structure-cautions").contains("δP comes from the measured properties instead"), text(ed, "#structure-cautions"));
        String check = ((Label) ed.dialog().getDialogPane().lookup("#structure-check")).getText();
        assertTrue(check.contains("against δt") && check.contains("δH as the remainder of δt"), check);
        shoot1280(robot, ed, "structure-property-route-1280x800");

        // a measured value changed after the estimate must be estimated again before saving
        boolean[] ok = new boolean[1];
        robot.interact(() -> {
            ed.structure().measuredField("dipole").setText("4.1");
            ok[0] = ed.validate();
        });
        assertFalse(ok[0]);
        robot.interact(() -> {
            ed.structure().measuredField("dipole").setText("3.96");
            ed.structure().estimate();
        });
        fx.awaitJobs();
        robot.interact(() -> ok[0] = ed.validate());
        assertTrue(ok[0], text(ed, "#editor-problems"));
        Solvent s = ed.result();
        assertEquals(Double.parseDouble(ed.field("dP").getText()), s.hansen().dP(), 1e-9);
        assertTrue(s.note().contains("dipole moment (Hansen–Beerbower)"), "the note names the route: " + s.note());
        assertEquals(52.9, s.hvapKjPerMol(), 1e-9, "the measured ΔHvap is kept with the entry");
        assertEquals("user", s.sources().get("hvap"));
        robot.interact(() -> ed.dialog().close());

        // the Material step's structure form has its own density field: the same core estimate gives the centre
        robot.interact(() -> {
            fx.workbench.show(Screen.TARGET);
            robot.lookup("#target-ways").queryAs(TabPane.class).getSelectionModel().select(2);
        });
        Parent form = robot.lookup("#target-structure").queryAs(Parent.class);
        assertTrue(form.lookup("#structure-density").getParent().isVisible());
        robot.interact(() -> {
            ((TextField) form.lookup("#structure-target-name")).setText("DMSO-like solute (test)");
            ((TextField) form.lookup("#structure-smiles")).setText(dmso);
            ((TextField) form.lookup("#structure-density")).setText("1.100");
            ((TextField) form.lookup("#structure-dipole")).setText("3.96");
            ((Button) form.lookup("#structure-estimate")).fire();
        });
        fx.awaitJobs();
        robot.interact(() -> ((Button) form.lookup("#structure-target-apply")).fire());
        StructureEstimate t = StructureEntries.estimate("SMILES", dmso, new MeasuredProperties(1.100, null, 3.96, null));
        assertEquals(Math.round(t.dP().value() * 10) / 10.0, fx.session.target().sphere().centre().dP(), 1e-9);
    }

    /** The dialog as on a 1280×800 screen, when -Dcohesa.screenshots=DIR is set. */
    private static void shoot1280(FxRobot robot, SolventEditor ed, String name) {
        String dir = System.getProperty("cohesa.screenshots");
        if (dir == null || dir.isBlank()) {
            return;
        }
        robot.interact(() -> {
            ed.dialog().setWidth(1280);
            ed.dialog().setHeight(800);
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> Snapshots.savePng(ed.dialog().getDialogPane().getScene().snapshot(null), Path.of(dir, name + ".png")));
    }

    private SolventEditor openEditor(FxRobot robot) {
        return openEditor(robot, null);
    }

    private SolventEditor openEditor(FxRobot robot, Solvent existing) {
        SolventEditor[] ed = new SolventEditor[1];
        robot.interact(() -> {
            ed[0] = new SolventEditor(existing, fx.session.jobs());
            ed[0].dialog().initOwner(stage);
            ed[0].dialog().show();
        });
        return ed[0];
    }

    /** The label's text, or the texts of every label inside a container joined by " | ". */
    private static String text(SolventEditor ed, String id) {
        Node n = ed.dialog().getDialogPane().lookup(id);
        if (n instanceof Label l) {
            return l.getText();
        }
        StringBuilder b = new StringBuilder();
        for (Node c : n.lookupAll(".label")) {
            if (c instanceof Label l && c != n) {
                b.append(b.length() == 0 ? "" : " | ").append(l.getText());
            }
        }
        return b.toString();
    }

    private static long inkPixels(Image img) {
        long n = 0;
        for (int y = 0; y < (int) img.getHeight(); y++) {
            for (int x = 0; x < (int) img.getWidth(); x++) {
                if ((img.getPixelReader().getArgb(x, y) & 0xFFFFFF) != 0xFFFFFF) {
                    n++;
                }
            }
        }
        return n;
    }

    /** Writes a screenshot of {@code node}'s scene when -Dcohesa.screenshots=DIR is set. */
    private static void shoot(FxRobot robot, Node node, String name) {
        String dir = System.getProperty("cohesa.screenshots");
        if (dir == null || dir.isBlank()) {
            return;
        }
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> Snapshots.savePng(node.getScene().snapshot(null), Path.of(dir, name + ".png")));
    }

    /** Writes a picture of {@code node} alone, at its own full size (e.g. a scrolled form), when -Dcohesa.screenshots=DIR is set. */
    private static void shootNode(FxRobot robot, Node node, String name) {
        String dir = System.getProperty("cohesa.screenshots");
        if (dir == null || dir.isBlank()) {
            return;
        }
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> Snapshots.savePng(node.snapshot(null, null), Path.of(dir, name + ".png")));
    }

    private Solvent find(String name) {
        return fx.session.solvents().stream().filter(s -> s.name().equalsIgnoreCase(name)).findFirst().orElse(null);
    }
}
