package org.cohesa.desktop.common;

import javafx.beans.property.ObjectProperty;
import javafx.scene.control.Spinner;
import javafx.scene.control.SpinnerValueFactory;
import javafx.util.StringConverter;

/** Whole-number spinners that take typed input: committed on Enter and when the field loses focus, clamped to the range. */
public final class Spinners {

    private Spinners() {
    }

    /** A spinner from {@code min} to {@code max} bound both ways to {@code value}. */
    public static Spinner<Integer> integer(int min, int max, ObjectProperty<Integer> value) {
        SpinnerValueFactory.IntegerSpinnerValueFactory f = new SpinnerValueFactory.IntegerSpinnerValueFactory(min, max,
                Math.max(min, Math.min(max, value.get())));
        f.setConverter(new StringConverter<>() {
            @Override
            public String toString(Integer v) {
                return v == null ? "" : String.valueOf(v);
            }

            @Override
            public Integer fromString(String text) {
                try {
                    int v = Integer.parseInt(text.strip());
                    return Math.max(min, Math.min(max, v));
                } catch (NumberFormatException | NullPointerException e) {
                    return f.getValue(); // not a whole number: keep the last good value
                }
            }
        });
        Spinner<Integer> s = new Spinner<>(f);
        s.setEditable(true);
        s.setPrefWidth(90);
        f.valueProperty().bindBidirectional(value);
        // a whole number typed in the range counts at once (no Enter needed); anything else is settled on leaving the field
        s.getEditor().textProperty().addListener((o, a, text) -> {
            try {
                int v = Integer.parseInt(text.strip());
                if (v >= min && v <= max && v != f.getValue()) {
                    f.setValue(v);
                }
            } catch (NumberFormatException e) {
                // not (yet) a number: wait for more typing or for the field to lose focus
            }
        });
        s.getEditor().focusedProperty().addListener((o, was, now) -> {
            if (!now) {
                commit(s);
            }
        });
        return s;
    }

    /** Takes whatever is typed in the editor as the value (and shows the clamped value back). */
    public static void commit(Spinner<Integer> s) {
        if (!s.isEditable()) {
            return;
        }
        Integer v = s.getValueFactory().getConverter().fromString(s.getEditor().getText());
        s.getValueFactory().setValue(v);
        s.getEditor().setText(s.getValueFactory().getConverter().toString(s.getValueFactory().getValue()));
    }
}
