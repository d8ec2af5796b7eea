package org.cohesa.desktop;

import java.nio.file.Path;
import javafx.animation.PauseTransition;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.cohesa.store.DataHome;

/** The desktop workbench. {@code --screenshot=FILE} renders the window once to a PNG and exits (for docs and CI). */
public final class CohesaApp extends Application {

    @Override
    public void start(Stage stage) {
        Path db = DataHome.defaultDatabase();
        Workbench workbench = new Workbench(db);
        Scene scene = new Scene(workbench.root(), 1280, 800);
        stage.setTitle("Cohesa — solvent and blend workbench");
        stage.setScene(scene);
        stage.show();
        workbench.load();
        String shot = getParameters().getNamed().get("screenshot");
        if (shot != null) {
            PauseTransition wait = new PauseTransition(Duration.seconds(2.5));
            wait.setOnFinished(e -> {
                Snapshots.savePng(scene.snapshot(null), Path.of(shot));
                Platform.exit();
            });
            wait.play();
        }
    }
}
