package org.cohesa.desktop;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.cohesa.desktop.common.Session;
import org.testfx.util.WaitForAsyncUtils;

/** A workbench on a scratch database in a real (headless) stage, for the desktop tests. */
final class DesktopFixture {

    /** Monocle draws no 3D and logs one warning per 3D node; kept quiet so real problems stand out. */
    private static final java.util.logging.Logger JAVAFX_LOG = java.util.logging.Logger.getLogger("javafx");

    static {
        JAVAFX_LOG.setLevel(java.util.logging.Level.SEVERE);
    }

    final Path folder;
    final Session session;
    final Workbench workbench;

    DesktopFixture(Stage stage) throws Exception {
        this(stage, Files.createTempDirectory("cohesa-desktop-test"));
    }

    /** On the database in {@code folder}: tests of one class share it, so the bundled table is imported once. */
    DesktopFixture(Stage stage, Path folder) throws Exception {
        this.folder = folder;
        session = new Session(folder.resolve("cohesa.db"));
        workbench = new Workbench(session);
        Scene scene = new Scene(workbench.root(), 1280, 800);
        scene.getStylesheets().add(CohesaApp.class.getResource("cohesa.css").toExternalForm());
        stage.setScene(scene);
        stage.show();
        workbench.load(null);
    }

    /** Waits until the library is loaded (the first load builds the database from the bundled table). */
    void awaitLibrary() throws Exception {
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> session.solvents().size() >= 8 && !session.jobs().runningProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Waits until no background job is running. */
    void awaitJobs() throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> !session.jobs().runningProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Fills the candidate form with {@code form} on the FX thread, runs the search and waits for it: the rows found. */
    java.util.List<org.cohesa.desktop.blend.BlendModel.Row> searchCandidates(org.testfx.api.FxRobot robot, Runnable form) throws Exception {
        robot.interact(() -> {
            workbench.show(Screen.BLENDS);
            form.run();
            robot.lookup("#blend-search").queryAs(javafx.scene.control.Button.class).fire();
        });
        awaitJobs();
        return java.util.List.copyOf(workbench.blendModel().rows());
    }

    /** Each row's components joined by " + ", in rank order (to compare with the command line's list). */
    static java.util.List<String> names(java.util.List<org.cohesa.desktop.blend.BlendModel.Row> rows) {
        return rows.stream().map(r -> String.join(" + ", r.blend().components().stream().map(c -> c.solvent().name()).toList())).toList();
    }

    /** The same for the {@code blends} array of {@code cohesa blend --json}. */
    static java.util.List<String> names(com.fasterxml.jackson.databind.JsonNode blends) {
        java.util.List<String> out = new java.util.ArrayList<>();
        for (com.fasterxml.jackson.databind.JsonNode b : blends) {
            java.util.List<String> parts = new java.util.ArrayList<>();
            b.get("components").forEach(c -> parts.add(c.get("name").asText()));
            out.add(String.join(" + ", parts));
        }
        return out;
    }
}
