package org.cohesa.desktop.drying;

import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.DryingRequest;
import org.cohesa.core.drying.DryingSimulator;
import org.cohesa.core.drying.PathPoint;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.common.Session;

/**
 * View-model of the drying screen: the blend (typed in blend notation, or the one selected on the blend
 * screen), temperature and model choice; runs the drying simulation ({@link DryingSimulator}) and the safety
 * profile ({@link SafetyProfiler}) off the FX thread and publishes the path to the session for the plots.
 */
public final class DryingModel {

    /** What one run produced. */
    public record Result(Blend blend, DryingPath path, SafetyProfile safety) {
    }

    private final Session session;
    private final StringProperty blendText = new SimpleStringProperty("");
    private final StringProperty temperatureC = new SimpleStringProperty("25");
    private final BooleanProperty ideal = new SimpleBooleanProperty(false);
    private final ObjectProperty<Result> result = new SimpleObjectProperty<>();
    private final StringProperty problem = new SimpleStringProperty("");
    private boolean publishing;

    public DryingModel(Session session) {
        this.session = session;
        // RED along the path is to the target it was computed for
        session.targetProperty().addListener((o, a, t) -> result.set(null));
        session.selectedBlendProperty().addListener((o, a, b) -> {
            if (b != null && !publishing) {
                blendText.set(b.describe());
            }
        });
    }

    public Session session() {
        return session;
    }

    public StringProperty blendTextProperty() {
        return blendText;
    }

    public StringProperty temperatureProperty() {
        return temperatureC;
    }

    public BooleanProperty idealProperty() {
        return ideal;
    }

    public ObjectProperty<Result> resultProperty() {
        return result;
    }

    /** Why the last run failed, in one line for the drying pane itself (empty after a success). */
    public StringProperty problemProperty() {
        return problem;
    }

    /** Computes the path and the safety profile of the blend in the form; {@code then} runs on success. */
    public void run(Runnable then) {
        run(then, null);
    }

    /** As {@link #run(Runnable)}; {@code otherwise} runs on the FX thread when the computation fails. */
    public void run(Runnable then, Runnable otherwise) {
        SolventLibrary library = new SolventLibrary(List.copyOf(session.solvents()));
        String text = blendText.get() == null ? "" : blendText.get().strip();
        double kelvin = parseTemperature(temperatureC.get()) + 273.15;
        boolean idealModel = ideal.get();
        SolubilitySphere target = session.target() == null ? null : session.target().sphere();
        problem.set("");
        session.jobs().run("Computing the drying path", p -> {
            Blend blend = parseBlend(library, text);
            p.update(0.1, "Simulating evaporation of " + blend.describe() + "…");
            DryingPath path = DryingSimulator.simulate(new DryingRequest(blend, target, kelvin, DryingRequest.DEFAULT_UNTIL, idealModel,
                    0.025, false));
            if (p.isCancelled()) {
                return null;
            }
            p.update(0.7, "Safety profile…");
            SafetyProfile safety = SafetyProfiler.profile(blend, kelvin, idealModel);
            return new Result(blend, path, safety);
        }, r -> {
            if (r == null) {
                return;
            }
            result.set(r);
            publishing = true;
            session.selectedBlendProperty().set(r.blend());
            publishing = false;
            session.dryingPathProperty().set(r.path().points().stream().map(PathPoint::hansen).toList());
            if (then != null) {
                then.run();
            }
        }, err -> {
            result.set(null);
            session.dryingPathProperty().set(List.of());
            problem.set("The drying path of " + (text.isEmpty() ? "this blend" : text) + " could not be computed: " + err);
            if (otherwise != null) {
                otherwise.run();
            }
        });
    }

    static Blend parseBlend(SolventLibrary library, String text) {
        if (text.isEmpty()) {
            throw new InvalidInputException("blend", text, "write a blend as NAME:FRACTION,NAME:FRACTION (e.g. toluene:0.6,ethanol:0.4)");
        }
        return text.contains(":") ? library.resolveBlend("blend", text) : Blend.pure(library.resolve("blend", text));
    }

    static double parseTemperature(String text) {
        try {
            double c = Double.parseDouble(text == null ? "" : text.strip());
            if (c < -50 || c > 200) {
                throw new InvalidInputException("temperature", text, "must lie between −50 and 200 °C");
            }
            return c;
        } catch (NumberFormatException e) {
            throw new InvalidInputException("temperature", String.valueOf(text), "not a number of °C");
        }
    }
}
