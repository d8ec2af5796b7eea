package org.cohesa.desktop.common;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ListView;
import javafx.scene.layout.VBox;
import javafx.scene.control.Label;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** File choosers and message boxes with the app's wording; messages are plain lines, never stack traces. */
public final class Dialogs {

    private Dialogs() {
    }

    public static Path saveFile(Node owner, String title, String suggestedName, String description, String pattern) {
        FileChooser fc = new FileChooser();
        fc.setTitle(title);
        fc.setInitialFileName(suggestedName);
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(description, pattern));
        File f = fc.showSaveDialog(window(owner));
        return f == null ? null : f.toPath();
    }

    public static Path openFile(Node owner, String title, String description, String pattern) {
        FileChooser fc = new FileChooser();
        fc.setTitle(title);
        fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter(description, pattern),
                new FileChooser.ExtensionFilter("All files", "*"));
        File f = fc.showOpenDialog(window(owner));
        return f == null ? null : f.toPath();
    }

    /** A problem with a list of details (e.g. every bad cell of an import), in a scrollable list. */
    public static void problems(Node owner, String title, String summary, List<String> lines) {
        Alert a = new Alert(Alert.AlertType.WARNING, "", ButtonType.OK);
        a.initOwner(window(owner));
        a.setTitle(title);
        a.setHeaderText(summary);
        ListView<String> list = new ListView<>();
        list.setId("problem-list");
        list.getItems().setAll(lines);
        list.setPrefSize(640, Math.min(360, 28 + 24.0 * lines.size()));
        VBox box = new VBox(6, new Label("Nothing was changed. Fix these and try again:"), list);
        a.getDialogPane().setContent(box);
        a.setResizable(true);
        a.show();
    }

    public static void message(Node owner, String title, String text) {
        Alert a = new Alert(Alert.AlertType.INFORMATION, text, ButtonType.OK);
        a.initOwner(window(owner));
        a.setTitle(title);
        a.setHeaderText(null);
        a.show();
    }

    public static boolean confirm(Node owner, String title, String text) {
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, text, ButtonType.OK, ButtonType.CANCEL);
        a.initOwner(window(owner));
        a.setTitle(title);
        a.setHeaderText(null);
        return a.showAndWait().filter(ButtonType.OK::equals).isPresent();
    }

    private static Window window(Node owner) {
        return owner == null || owner.getScene() == null ? null : owner.getScene().getWindow();
    }
}
