package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.activity.Miscibility;
import org.cohesa.core.activity.MiscibilityResult;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.CancellationToken;
import org.cohesa.core.blend.PhaseCheck;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;

/**
 * View-model of the blend-design screen: the constraints as text and choices (validated into
 * {@link BlendConstraints} when the search starts), the search ({@link BlendDesigner}) off the FX thread with
 * progress and cancel, and the ranked suggestions each with its safety profile ({@link SafetyProfiler}).
 */
public final class BlendModel {

    /** One suggestion with its safety profile (null when the profile could not be computed). */
    public record Row(int rank, BlendSuggestion suggestion, SafetyProfile safety, String safetyProblem) {
        public org.cohesa.core.solvent.Blend blend() {
            return suggestion.blend().blend();
        }
    }

    private final Session session;
    public final ObjectProperty<Integer> maxComponents = new SimpleObjectProperty<>(3);
    public final ObjectProperty<Integer> top = new SimpleObjectProperty<>(20);
    public final ObjectProperty<RankBy> rankBy = new SimpleObjectProperty<>(RankBy.DESIRABILITY); // as the command line
    public final StringProperty include = new SimpleStringProperty("");
    public final StringProperty exclude = new SimpleStringProperty("");
    public final StringProperty fixed = new SimpleStringProperty("");
    public final StringProperty minFractionPercent = new SimpleStringProperty("5");
    public final StringProperty boilingMin = new SimpleStringProperty("");
    public final StringProperty boilingMax = new SimpleStringProperty("");
    public final StringProperty minFlashPoint = new SimpleStringProperty("");
    public final ObjectProperty<String> maxIchClass = new SimpleObjectProperty<>("any");
    public final BooleanProperty noCmr = new SimpleBooleanProperty(true);
    public final StringProperty maxCost = new SimpleStringProperty("");
    public final StringProperty redLimit = new SimpleStringProperty("0.8"); // as the command line: a margin of 0.2 from the surface
    public final StringProperty temperatureC = new SimpleStringProperty("25");
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ObservableList<Row> compared = FXCollections.observableArrayList();
    private CancellationToken cancel;

    public BlendModel(Session session) {
        this.session = session;
        // suggestions belong to the target they were searched for: a new target (picked, fitted, typed) clears them
        session.targetProperty().addListener((o, a, t) -> {
            rows.clear();
            compared.clear();
        });
        session.jobs().runningProperty().addListener((o, a, running) -> {
            if (!running && cancel != null) {
                cancel = null;
            }
        });
    }

    public Session session() {
        return session;
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    /** Up to four suggestions shown side by side. */
    public ObservableList<Row> compared() {
        return compared;
    }

    /** Runs the search against the current target. @throws InvalidInputException naming the first bad field */
    public void search(Runnable then) {
        TargetChoice target = session.target();
        if (target == null) {
            throw new InvalidInputException("target", "", "set a target first (target screen: pick a material, fit or type in a sphere)");
        }
        SolventLibrary lib = new SolventLibrary(List.copyOf(session.solvents()));
        BlendConstraints c = constraints(lib);
        int k = maxComponents.get();
        if (c.fixed().size() >= k) {
            throw new InvalidInputException("most components", String.valueOf(k), "must exceed the number of fixed components");
        }
        double limit = positive("RED limit", redLimit.get(), 1.0);
        double kelvin = number("temperature", temperatureC.get(), 25.0) + 273.15;
        BlendDesigner.Request req = new BlendDesigner.Request(target.sphere(), c, k, top.get(), rankBy.get(), limit, false, kelvin);
        CancellationToken token = new CancellationToken();
        cancel = token;
        session.jobs().run("Searching blends", p -> {
            Thread watcher = new Thread(() -> {
                while (!token.isCancelled()) {
                    if (p.isCancelled()) {
                        token.cancel();
                    }
                    try {
                        Thread.sleep(100);
                    } catch (InterruptedException e) {
                        return;
                    }
                }
            }, "blend-cancel-watch");
            watcher.setDaemon(true);
            watcher.start();
            try {
                BlendDesigner.Result r = BlendDesigner.design(lib.all(), req, miscibility(),
                        (done, total) -> p.update(total == 0 ? -1 : 0.9 * done / (double) total, null), token);
                List<Row> out = new ArrayList<>();
                int i = 1;
                for (BlendSuggestion s : r.suggestions()) {
                    if (p.isCancelled()) {
                        break;
                    }
                    p.update(0.9 + 0.1 * i / Math.max(1, r.suggestions().size()), "Safety profile of suggestion " + i + "…");
                    SafetyProfile safety = null;
                    String problem = null;
                    try {
                        safety = SafetyProfiler.profile(s.blend().blend(), kelvin);
                    } catch (RuntimeException e) {
                        problem = e.getMessage();
                    }
                    out.add(new Row(i++, s, safety, problem));
                }
                return out;
            } finally {
                token.cancel();
            }
        }, out -> {
            rows.setAll(out);
            compared.clear();
            session.jobs().say(out.size() + " candidates for " + target.name() + (out.isEmpty() ? ": loosen the constraints." : "."));
            if (then != null) {
                then.run();
            }
        });
    }

    /** The two-phase test: the shared activity-coefficient module's miscibility check. */
    static PhaseCheck miscibility() {
        return (components, fractions, kelvin) -> {
            MiscibilityResult r;
            try {
                r = Miscibility.check(components, fractions, kelvin);
            } catch (IllegalArgumentException e) {
                return PhaseCheck.Verdict.notChecked(e.getMessage());
            }
            return new PhaseCheck.Verdict(true, r.splits(), r.model(), r.detail());
        };
    }

    BlendConstraints constraints(SolventLibrary lib) {
        List<Solvent> inc = names(lib, "include only", include.get());
        List<Solvent> exc = names(lib, "exclude", exclude.get());
        List<BlendComponent> fix = new ArrayList<>();
        String f = fixed.get() == null ? "" : fixed.get().strip();
        if (!f.isEmpty()) {
            for (String part : f.split(";")) {
                int colon = part.lastIndexOf(':');
                if (colon <= 0) {
                    throw new InvalidInputException("fixed", part, "write NAME:FRACTION, e.g. water:0.2 (several separated by ;)");
                }
                double frac = number("fixed", part.substring(colon + 1), null);
                if (frac <= 0 || frac >= 1) {
                    throw new InvalidInputException("fixed", part, "the fraction must lie between 0 and 1");
                }
                fix.add(new BlendComponent(lib.resolve("fixed", part.substring(0, colon).strip()), frac));
            }
        }
        double minF = number("minimum fraction (%)", minFractionPercent.get(), 5.0) / 100;
        if (minF < 0 || minF >= 1) {
            throw new InvalidInputException("minimum fraction (%)", minFractionPercent.get(), "must lie between 0 and 100");
        }
        Integer ich = "any".equals(maxIchClass.get()) || maxIchClass.get() == null ? null : Integer.valueOf(maxIchClass.get().substring(0, 1));
        try {
            return new BlendConstraints(inc, exc, Set.of(), Set.of(), fix, minF, 1.0, java.util.Map.of(),
                    optional("boiling point min.", boilingMin.get()), optional("boiling point max.", boilingMax.get()),
                    optional("minimum flash point", minFlashPoint.get()), ich, noCmr.get(), optional("maximum cost", maxCost.get()));
        } catch (IllegalArgumentException e) {
            throw e instanceof InvalidInputException ? e : new InvalidInputException("constraints", "", e.getMessage());
        }
    }

    private static List<Solvent> names(SolventLibrary lib, String field, String text) {
        if (text == null || text.isBlank()) {
            return List.of();
        }
        List<Solvent> out = new ArrayList<>();
        for (String n : text.split(";")) {
            if (!n.isBlank()) {
                out.add(lib.resolve(field, n.strip()));
            }
        }
        return out;
    }

    private static Double optional(String field, String text) {
        return text == null || text.isBlank() ? null : number(field, text, null);
    }

    private static double positive(String field, String text, Double dflt) {
        double v = number(field, text, dflt);
        if (v <= 0) {
            throw new InvalidInputException(field, text, "must be positive");
        }
        return v;
    }

    private static double number(String field, String text, Double dflt) {
        if ((text == null || text.isBlank()) && dflt != null) {
            return dflt;
        }
        try {
            double v = Double.parseDouble(text.strip());
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException | NullPointerException e) {
            throw new InvalidInputException(field, String.valueOf(text), "not a number (use a dot as decimal separator)");
        }
    }
}
