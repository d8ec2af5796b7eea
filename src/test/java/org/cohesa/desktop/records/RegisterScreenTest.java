package org.cohesa.desktop.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.CohesaApp;
import org.cohesa.desktop.common.Session;
import org.cohesa.store.Database;
import org.cohesa.store.LocalAccount;
import org.cohesa.store.RecordFixtures;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.RegisterStores;
import org.cohesa.store.SolventRepository;
import org.cohesa.store.SqliteRegister;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The register screen on both stores, as people at different desks use it: it says which register it shows and under
 * which account the user acts, lists and shows the records with the account of every step, refuses an approval the
 * four-eyes rule forbids (in the status bar, nothing written), records one that it allows, and verifies the register —
 * all through the screen's own buttons and dialogs, the work on a worker thread. PostgreSQL runs need
 * {@code COHESA_TEST_POSTGRES} (see {@link RegisterStores}) and are skipped with its message otherwise.
 */
@ExtendWith(ApplicationExtension.class)
class RegisterScreenTest {

    @TempDir
    static Path shared;
    static SolventLibrary library;

    private Path dbFile;
    private Session session;
    private RecordsModel model;
    private Stage stage;
    private RegisterStores.Store store;

    @BeforeAll
    static void loadLibrary() {
        try (Database db = Database.open(shared.resolve("library.db"))) {
            library = new SolventRepository(db).library();
        }
    }

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        dbFile = Files.createTempDirectory("cohesa-register-screen").resolve("cohesa.db");
        Files.copy(shared.resolve("library.db"), dbFile);
        session = new Session(dbFile);
        model = new RecordsModel(session);
        Scene scene = new Scene((javafx.scene.Parent) new RecordsView(model).node(), 1280, 800);
        scene.getStylesheets().add(CohesaApp.class.getResource("cohesa.css").toExternalForm());
        stage.setScene(scene);
        stage.show();
    }

    @AfterEach
    void closeStore() {
        if (store != null) {
            store.close();
        }
    }

    private void awaitJobs() throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> !session.jobs().runningProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
    }

    @SuppressWarnings("unchecked")
    private TableView<SubstitutionRecord> table(FxRobot robot) {
        return robot.lookup("#records-table").queryAs(TableView.class);
    }

    private String message() {
        return session.jobs().messageProperty().get();
    }

    /** Selects record {@code id}, opens the approval dialog, types the name and a comment, and confirms. */
    private void approveThroughTheDialog(FxRobot robot, long id, String by, String comment) throws Exception {
        TableView<SubstitutionRecord> t = table(robot);
        robot.interact(() -> {
            for (int i = 0; i < t.getItems().size(); i++) {
                if (t.getItems().get(i).id() == id) {
                    t.getSelectionModel().clearAndSelect(i);
                }
            }
        });
        robot.clickOn("#records-approve");
        WaitForAsyncUtils.waitForFxEvents();
        TextField name = robot.lookup("#decision-by").queryAs(TextField.class);
        TextField note = robot.lookup("#decision-comment").queryAs(TextField.class);
        robot.interact(() -> {
            name.setText(by);
            note.setText(comment);
        });
        robot.clickOn("OK");
        awaitJobs();
    }

    private SubstitutionRecord shown(FxRobot robot, long id) {
        return table(robot).getItems().stream().filter(r -> r.id() == id).findFirst().orElseThrow();
    }

    @Test
    void theSharedRegisterOnPostgresql(FxRobot robot) throws Exception {
        String why = RegisterStores.postgresUnavailable();
        assumeTrue(why == null, why);
        store = RegisterStores.postgres();
        // alice files at her desk, bob reviews at his
        store.as("alice", null).create(RecordFixtures.draft(library, "Enamel thinner, line 2 (invented demo)", "toluene",
                "n-butyl acetate:0.6,ethyl acetate:0.4"), "A. Chemist");
        store.as("bob", null).changeStatus(1, RecordStatus.IN_REVIEW, "Q. Reviewer", "evidence complete");
        store.as("alice", null).create(RecordFixtures.draft(library, "Extraction step 4 (invented demo)", "dichloromethane",
                "2-methyltetrahydrofuran"), "A. Chemist");

        // bob points the screen at the shared register through the Register… dialog
        robot.clickOn("#records-which");
        WaitForAsyncUtils.waitForFxEvents();
        TextField address = robot.lookup("#register-address").queryAs(TextField.class);
        robot.interact(() -> address.setText(store.address("bob")));
        robot.clickOn("Connect");
        awaitJobs();
        assertEquals(2, table(robot).getItems().size(), message());
        String where = robot.lookup("#records-register").queryAs(Label.class).getText();
        assertTrue(where.startsWith("Shared register postgresql://bob@") && where.contains("you: bob (database login)")
                && where.contains("four eyes on") && where.contains("sealed by the server's secret"), where);

        // the reviewer's login cannot approve, whatever name is typed: refused in the status bar, nothing written
        approveThroughTheDialog(robot, 1, "M. Manager", "trials passed");
        assertTrue(session.jobs().failedProperty().get(), message());
        assertTrue(message().contains("four-eyes rule") && message().contains("(bob)"), message());
        assertEquals(RecordStatus.IN_REVIEW, shown(robot, 1).status());
        assertEquals(3, store.as("erin", null).chain().size(), "the refused approval wrote nothing");

        // carol, a third login, approves from the same screen
        robot.interact(() -> model.useRegister(store.address("carol"), null));
        awaitJobs();
        approveThroughTheDialog(robot, 1, "M. Manager", "trials passed");
        assertFalse(session.jobs().failedProperty().get(), message());
        assertEquals(RecordStatus.APPROVED, shown(robot, 1).status());
        assertEquals("M. Manager (carol)", RecordsView.lastStep(shown(robot, 1)));
        robot.interact(() -> table(robot).getSelectionModel().clearAndSelect(
                table(robot).getItems().indexOf(shown(robot, 1))));
        String details = robot.lookup("#record-details").queryAs(TextArea.class).getText();
        assertTrue(details.contains("by A. Chemist (account alice)") && details.contains("by Q. Reviewer (account bob)")
                && details.contains("by M. Manager (account carol)"), details);

        robot.clickOn("#records-verify");
        awaitJobs();
        assertTrue(message().startsWith("Register intact: 4 events in 2 records, seals checked"), message());
        snapshot(robot, "register-shared-headless.png");
    }

    @Test
    void theLocalRegister(FxRobot robot) throws Exception {
        try (Database db = Database.open(dbFile)) {
            new RecordRepository(new SqliteRegister(db, "alice"), java.time.Clock.systemUTC(), null).create(
                    RecordFixtures.draft(library, "Degreasing bath (invented demo)", "toluene", "ethyl acetate"), "A. Chemist");
            new RecordRepository(new SqliteRegister(db, "bob"), java.time.Clock.systemUTC(), null)
                    .changeStatus(1, RecordStatus.IN_REVIEW, "Q. Reviewer", null);
        }
        robot.interact(() -> model.reload(null));
        awaitJobs();
        String where = robot.lookup("#records-register").queryAs(Label.class).getText();
        assertTrue(where.startsWith("Local register " + dbFile) && where.contains("you: " + LocalAccount.current()
                + " (operating-system account)"), where);
        try (LocalAccount.Scope asBob = LocalAccount.actAsInThisProcess("bob")) {
            robot.interact(() -> model.reload(null));
            awaitJobs();
            approveThroughTheDialog(robot, 1, "M. Manager", "ok");
            assertTrue(message().contains("four-eyes rule") && message().contains("operating-system account (bob)"), message());
            assertEquals(RecordStatus.IN_REVIEW, shown(robot, 1).status());
        }
        try (LocalAccount.Scope asCarol = LocalAccount.actAsInThisProcess("carol")) {
            approveThroughTheDialog(robot, 1, "M. Manager", "ok");
            assertEquals(RecordStatus.APPROVED, shown(robot, 1).status(), message());
            assertEquals("M. Manager (carol)", RecordsView.lastStep(shown(robot, 1)));
        }
        robot.clickOn("#records-verify");
        awaitJobs();
        assertTrue(message().startsWith("Register intact: 3 events in 1 records, seals checked"), message());
    }

    /** A headless picture of the screen for the build's own record (the documented screenshots are taken under Xvfb). */
    private void snapshot(FxRobot robot, String name) throws Exception {
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = stage.getScene().snapshot(null));
        Path out = Path.of("target", "screenshots");
        Files.createDirectories(out);
        org.cohesa.desktop.Snapshots.savePng(img[0], out.resolve(name));
    }
}
