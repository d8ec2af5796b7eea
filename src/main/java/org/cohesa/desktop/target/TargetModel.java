package org.cohesa.desktop.target;

import java.util.Comparator;
import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;

/**
 * View-model of the target screen: the sphere typed in as text (validated field by field), and the
 * library's liquids ranked by RED to the current target.
 */
public final class TargetModel {

    /** A library liquid with its distance to the target. */
    public record Ranked(Solvent solvent, double ra, double red) {
    }

    private final Session session;
    private final StringProperty name = new SimpleStringProperty("");
    private final StringProperty dD = new SimpleStringProperty("");
    private final StringProperty dP = new SimpleStringProperty("");
    private final StringProperty dH = new SimpleStringProperty("");
    private final StringProperty r0 = new SimpleStringProperty("");
    private final ObservableList<Ranked> ranked = FXCollections.observableArrayList();

    public TargetModel(Session session) {
        this.session = session;
        session.targetProperty().addListener((o, a, t) -> {
            showInFields(t);
            rank();
        });
        session.solvents().addListener((javafx.collections.ListChangeListener<Solvent>) c -> rank());
        showInFields(session.target());
        rank();
    }

    public Session session() {
        return session;
    }

    public StringProperty nameProperty() {
        return name;
    }

    public StringProperty dDProperty() {
        return dD;
    }

    public StringProperty dPProperty() {
        return dP;
    }

    public StringProperty dHProperty() {
        return dH;
    }

    public StringProperty r0Property() {
        return r0;
    }

    public ObservableList<Ranked> ranked() {
        return ranked;
    }

    /**
     * Makes the typed-in sphere the target.
     *
     * @throws InvalidInputException naming the first bad field
     */
    public void applyTypedSphere() {
        double d = number("δD", dD.get(), false);
        double p = number("δP", dP.get(), false);
        double h = number("δH", dH.get(), false);
        double r = number("R0", r0.get(), true);
        SolubilitySphere s = SolubilitySphere.of(d, p, h, r);
        session.targetProperty().set(new TargetChoice(name.get().isBlank() ? "typed-in sphere" : name.get(), s, "typed in"));
    }

    /**
     * Keeps the typed-in sphere as one of the user's own materials (validated like {@link #applyTypedSphere})
     * and makes it the target; the database write runs off the FX thread.
     *
     * @throws InvalidInputException naming the first bad field
     */
    public void saveTypedSphereAsMaterial(Runnable then) {
        applyTypedSphere();
        String label = name.get() == null ? "" : name.get().strip();
        if (label.isEmpty() || label.equals("typed-in sphere")) {
            throw new InvalidInputException("Name", label, "give the material a name of your own before keeping it");
        }
        SolubilitySphere sphere = session.target().sphere();
        session.jobs().run("Saving " + label, p -> {
            try (org.cohesa.store.Database db = session.openDatabase()) {
                org.cohesa.store.MaterialRepository repo = new org.cohesa.store.MaterialRepository(db);
                repo.add(new Material(label, List.of(), org.cohesa.core.target.MaterialKind.OTHER, sphere, "typed in by the user", null, true));
                return repo.all();
            }
        }, all -> {
            session.materials().setAll(all);
            session.jobs().say("Kept \"" + label + "\" as your own material.");
            if (then != null) {
                then.run();
            }
        });
    }

    /** Makes a library material the target (its published sphere, with its source). */
    public void useMaterial(Material m) {
        session.targetProperty().set(new TargetChoice(m.name(), m.sphere(), "material library, source: " + m.source()));
    }

    private static double number(String field, String text, boolean positive) {
        String t = text == null ? "" : text.strip();
        if (t.isEmpty()) {
            throw new InvalidInputException(field, t, "a number is required");
        }
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new InvalidInputException(field, t, "not a number (use a dot as decimal separator)");
        }
        if (!Double.isFinite(v) || v < 0 || (positive && v == 0) || v > 100) {
            throw new InvalidInputException(field, t, positive ? "must be a positive number of MPa½ (at most 100)"
                    : "must lie between 0 and 100 MPa½");
        }
        return v;
    }

    private void showInFields(TargetChoice t) {
        if (t == null) {
            return;
        }
        name.set(t.name());
        dD.set(fmt(t.sphere().centre().dD()));
        dP.set(fmt(t.sphere().centre().dP()));
        dH.set(fmt(t.sphere().centre().dH()));
        r0.set(fmt(t.sphere().r0()));
    }

    private static String fmt(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    private void rank() {
        TargetChoice t = session.target();
        if (t == null) {
            ranked.clear();
            return;
        }
        List<Ranked> list = session.solvents().stream().filter(Solvent::hasHansen)
                .map(s -> new Ranked(s, t.sphere().ra(s.hansen()), t.sphere().red(s.hansen())))
                .sorted(Comparator.comparingDouble(Ranked::red)).toList();
        ranked.setAll(list);
    }
}
