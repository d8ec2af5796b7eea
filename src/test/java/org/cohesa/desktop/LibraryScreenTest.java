package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.Clipboard;
import javafx.stage.Stage;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.library.SolventEditor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The library screen as a user meets it: find, sort, copy, export, add an entry, import a file with errors. */
@ExtendWith(ApplicationExtension.class)
class LibraryScreenTest {

    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new DesktopFixture(stage);
    }

    @SuppressWarnings("unchecked")
    private TableView<Solvent> table(FxRobot robot) {
        return robot.lookup("#solvent-table").queryAs(TableView.class);
    }

    @Test
    void filterFindsASolventBySynonymAndSelectionReachesTheSession(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> robot.lookup("#library-filter").queryAs(TextField.class).setText("EtOH"));
        TableView<Solvent> t = table(robot);
        assertTrue(t.getItems().stream().anyMatch(s -> s.name().equals("ethanol")), "the synonym EtOH finds ethanol");
        assertTrue(t.getItems().stream().noneMatch(s -> s.name().equals("toluene")));
        robot.interact(() -> t.getSelectionModel().select(0));
        assertEquals(t.getItems().get(0), fx.session.selectedSolventProperty().get());
        String details = robot.lookup("#solvent-details").queryAs(javafx.scene.control.TextArea.class).getText();
        assertTrue(details.contains("δD"), details);
    }

    @Test
    void copyAndExportGiveTheRowsAsShownWithCommaNamesQuoted(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        TableView<Solvent> t = table(robot);
        robot.interact(() -> fx.session.selectedSolventProperty().set(find("1,4-dioxane")));
        robot.interact(() -> org.cohesa.desktop.common.TableTools.copySelection(t));
        String[] copied = new String[1];
        robot.interact(() -> copied[0] = Clipboard.getSystemClipboard().getString());
        assertTrue(copied[0].startsWith("Name\tCAS\tFamily\tδD\tδP\tδH"), copied[0]);
        assertTrue(copied[0].contains("1,4-dioxane\t123-91-1"), copied[0]);
        Path out = fx.folder.resolve("export.csv");
        robot.interact(() -> {
            try {
                org.cohesa.desktop.common.TableTools.writeCsv(t, out);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        List<String> lines = Files.readAllLines(out, StandardCharsets.UTF_8);
        assertEquals(t.getItems().size() + 1, lines.size());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("\"1,4-dioxane\",123-91-1")), "RFC 4180 quotes a name with a comma");
    }

    @Test
    void theEntryFormRefusesBadValuesNamingTheFieldAndSavesAGoodEntry(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        SolventEditor[] ed = new SolventEditor[1];
        robot.interact(() -> {
            ed[0] = new SolventEditor(null);
            ed[0].field("name").setText("my test thinner");
            ed[0].field("dD").setText("16.1");
            ed[0].field("dP").setText("abc");
            ed[0].field("dH").setText("7");
            ed[0].field("cas").setText("64-17-6");
        });
        boolean[] ok = new boolean[1];
        robot.interact(() -> ok[0] = ed[0].validate());
        assertFalse(ok[0]);
        TextField dP = ed[0].field("dP");
        assertTrue(dP.getStyleClass().contains("field-error"), "the bad field is marked");
        assertTrue(ed[0].field("cas").getStyleClass().contains("field-error"), "a CAS number with a wrong check digit is marked");
        robot.interact(() -> {
            ed[0].field("dP").setText("5.2");
            ed[0].field("cas").setText("");
            ok[0] = ed[0].validate();
        });
        assertTrue(ok[0]);
        Solvent s = ed[0].result();
        assertEquals(5.2, s.hansen().dP(), 1e-12);
        robot.interact(() -> new org.cohesa.desktop.library.LibraryModel(fx.session).add(s, null));
        fx.awaitJobs();
        fx.awaitJobs();
        Solvent stored = find("my test thinner");
        assertNotNull(stored, "the new entry is in the library");
        assertTrue(stored.userEntry());
    }

    @Test
    void aBadImportIsRefusedWholeAndEveryBadCellIsListedOnTheScreen(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        int before = fx.session.solvents().size();
        Path csv = fx.folder.resolve("mine.csv");
        Files.writeString(csv, "name,dD,dP,dH,flash_point_c\n"
                + "\"my solvent, grade A\",16,5,7,30\n"
                + "bad one,16,x,7,30\n"
                + "worse one,16,5,7,hot\n", StandardCharsets.UTF_8);
        robot.interact(() -> fx.workbench.libraryModel().importCsv(csv, null));
        fx.awaitJobs();
        assertEquals(before, fx.session.solvents().size(), "nothing was stored");
        assertNull(find("my solvent, grade A"));
        assertTrue(fx.session.jobs().messageProperty().get().contains("2 bad cells"), fx.session.jobs().messageProperty().get());
        @SuppressWarnings("unchecked")
        ListView<String> list = robot.lookup("#import-problems").queryAs(ListView.class);
        assertTrue(list.getParent().isVisible(), "the problem list is shown");
        assertEquals(2, list.getItems().size());
        assertTrue(list.getItems().get(0).contains("line 3, column dP, value 'x'"), list.getItems().get(0));
        assertTrue(list.getItems().get(1).contains("line 4, column flash_point_c, value 'hot'"), list.getItems().get(1));
    }

    private Solvent find(String name) {
        return fx.session.solvents().stream().filter(s -> s.name().equalsIgnoreCase(name)).findFirst().orElse(null);
    }
}
