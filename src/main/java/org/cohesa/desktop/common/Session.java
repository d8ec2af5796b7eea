package org.cohesa.desktop.common;

import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.store.Database;

/**
 * State shared by the screens of one app session: the library, the target, what is selected. Screens bind
 * to these properties, so a click in the 3D view selects the row in the library table and a blend chosen on
 * the design screen appears in the plots. Touched on the FX thread only; database work goes through
 * {@link #jobs()}.
 */
public final class Session {

    private final Path databaseFile;
    private final Jobs jobs = new Jobs();
    private final ObservableList<Solvent> solvents = FXCollections.observableArrayList();
    private final ObservableList<Material> materials = FXCollections.observableArrayList();
    private final ObjectProperty<TargetChoice> target = new SimpleObjectProperty<>();
    private final ObjectProperty<Solvent> selectedSolvent = new SimpleObjectProperty<>();
    private final ObjectProperty<Blend> selectedBlend = new SimpleObjectProperty<>();
    private final ObjectProperty<List<HansenParameters>> dryingPath = new SimpleObjectProperty<>(List.of());
    private final StringProperty replacing = new SimpleStringProperty("");
    private final ObjectProperty<FittedTests> testedLiquids = new SimpleObjectProperty<>();

    /** The test results of a sphere fit and the sphere fitted to them. */
    public record FittedTests(org.cohesa.core.hsp.SolubilitySphere sphere, List<org.cohesa.core.target.TestResult> tests) {
        public FittedTests {
            tests = List.copyOf(tests);
        }
    }

    public Session(Path databaseFile) {
        this.databaseFile = databaseFile;
    }

    public Path databaseFile() {
        return databaseFile;
    }

    /** Opens the database for one piece of work (call from a worker thread). */
    public Database openDatabase() {
        return Database.open(databaseFile);
    }

    public Jobs jobs() {
        return jobs;
    }

    public ObservableList<Solvent> solvents() {
        return solvents;
    }

    /** The material library: published spheres and the user's own. */
    public ObservableList<Material> materials() {
        return materials;
    }

    public ObjectProperty<TargetChoice> targetProperty() {
        return target;
    }

    public TargetChoice target() {
        return target.get();
    }

    public ObjectProperty<Solvent> selectedSolventProperty() {
        return selectedSolvent;
    }

    public ObjectProperty<Blend> selectedBlendProperty() {
        return selectedBlend;
    }

    /** The liquid the case replaces (a solvent name or NAME:FRACTION,…), empty when the case only seeks a liquid. */
    public StringProperty replacingProperty() {
        return replacing;
    }

    /** The test results of the last sphere fit (the parameter panel marks them by result); empty before a fit. */
    public ObjectProperty<FittedTests> testedLiquidsProperty() {
        return testedLiquids;
    }

    /** The selected blend's parameters along its drying path (empty when none was computed). */
    public ObjectProperty<List<HansenParameters>> dryingPathProperty() {
        return dryingPath;
    }
}
