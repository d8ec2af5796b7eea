package org.cohesa.desktop.common;

import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;

/** Table columns of the app: text, and numbers shown right-aligned with a fixed number of decimals. */
public final class Columns {

    private Columns() {
    }

    public static <R> TableColumn<R, String> text(String title, Function<R, String> f, double width) {
        TableColumn<R, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(f.apply(cd.getValue())));
        c.setPrefWidth(width);
        return c;
    }

    /** A number column; sorting uses the value, the cell shows {@code decimals} decimals (none when negative: as stored). */
    public static <R> TableColumn<R, Double> number(String title, Function<R, Double> f, double width, int decimals) {
        TableColumn<R, Double> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(f.apply(cd.getValue())));
        c.setCellFactory(col -> new TableCell<>() {
            @Override
            protected void updateItem(Double v, boolean empty) {
                super.updateItem(v, empty);
                if (empty || v == null || !Double.isFinite(v)) {
                    setText("");
                } else {
                    setText(decimals < 0 ? Numbers.plain(v) : String.format(Locale.ROOT, "%." + decimals + "f", v));
                }
            }
        });
        c.setPrefWidth(width);
        c.getStyleClass().add("numeric");
        return c;
    }
}
