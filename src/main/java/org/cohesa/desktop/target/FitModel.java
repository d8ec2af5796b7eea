package org.cohesa.desktop.target;

import java.io.StringReader;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.FitOptions;
import org.cohesa.core.target.FitResult;
import org.cohesa.core.target.Interval;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.core.target.Misfit;
import org.cohesa.core.target.NamedPoint;
import org.cohesa.core.target.NextTest;
import org.cohesa.core.target.ResultProbability;
import org.cohesa.core.target.SphereFitter;
import org.cohesa.core.target.TestResult;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.Database;
import org.cohesa.store.MaterialRepository;
import org.cohesa.store.TestSeriesCsv;

/**
 * View-model of the fit on the target screen: the user's test results as CSV text (typed, pasted or loaded
 * from a file; columns of {@link TestSeriesCsv}), the fit ({@link SphereFitter}) run off the FX thread, and
 * its report (quality, misfits, confidence, next suggested tests). A successful fit becomes the target.
 */
public final class FitModel {

    private final Session session;
    private final StringProperty csv = new SimpleStringProperty("liquid,score\n");
    private final StringProperty name = new SimpleStringProperty("my material (fit)");
    private final ObjectProperty<FitResult> result = new SimpleObjectProperty<>();
    private final StringProperty report = new SimpleStringProperty("");
    /** A fitted sphere waiting for the user's word before it replaces the current target (null when none waits). */
    private final ObjectProperty<TargetChoice> pending = new SimpleObjectProperty<>();

    public FitModel(Session session) {
        this.session = session;
    }

    public StringProperty csvProperty() {
        return csv;
    }

    public StringProperty nameProperty() {
        return name;
    }

    public ObjectProperty<FitResult> resultProperty() {
        return result;
    }

    public StringProperty reportProperty() {
        return report;
    }

    /** The fitted sphere awaiting confirmation before it replaces the current target. */
    public ObjectProperty<TargetChoice> pendingProperty() {
        return pending;
    }

    /** Makes the waiting fitted sphere the target. */
    public void acceptPending() {
        TargetChoice t = pending.get();
        if (t != null) {
            pending.set(null);
            session.targetProperty().set(t);
            session.jobs().say("Target replaced by the fitted sphere " + t.name() + ".");
        }
    }

    /** Keeps the current target; the fit stays in the report (and can still be saved as a material). */
    public void keepCurrent() {
        if (pending.get() != null) {
            pending.set(null);
            session.jobs().say("Target kept: " + (session.target() == null ? "none" : session.target().name()) + ".");
        }
    }

    private record Outcome(FitResult fit, List<TestResult> tests) {
    }

    public void fit(Runnable then) {
        SolventLibrary library = new SolventLibrary(List.copyOf(session.solvents()));
        String text = csv.get() == null ? "" : csv.get();
        String label = name.get() == null || name.get().isBlank() ? "fitted sphere" : name.get().strip();
        session.jobs().run("Fitting the sphere", p -> {
            List<TestResult> results = TestSeriesCsv.read("test results", new StringReader(text), library);
            List<NamedPoint> candidates = library.searchable().stream().map(s -> new NamedPoint(s.name(), s.hansen())).toList();
            p.update(0.2, "Fitting " + results.size() + " test results (likelihood fit and its 95 % region)…");
            return new Outcome(SphereFitter.fit(results, candidates, FitOptions.defaults(FitOptions.DEFAULT_SEED)), results);
        }, outcome -> {
            FitResult r = outcome.fit();
            session.testedLiquidsProperty().set(new Session.FittedTests(r.sphere(), outcome.tests()));
            result.set(r);
            report.set(describe(r));
            TargetChoice fitted = new TargetChoice(label, r.sphere(), "fit of " + r.results() + " test results");
            if (session.target() == null) {
                session.targetProperty().set(fitted);
            } else {
                pending.set(fitted); // the user decides: the fit never silently replaces a target in use
                session.jobs().say("Fitted. Use the fitted sphere as the target instead of " + session.target().name() + "? (see the fit pane)");
            }
            if (then != null) {
                then.run();
            }
        }, err -> report.set("The fit could not run: " + err + detail(text, library)));
    }

    /**
     * Saves the last fit as one of the user's own materials (the same record {@code cohesa fit --save} writes),
     * so it can be picked again as a target and survives updates of the bundled library.
     */
    public void saveAsMaterial(Runnable then) {
        FitResult r = result.get();
        if (r == null) {
            report.set(report.get() + "\nFit the sphere first, then save it.");
            return;
        }
        String label = name.get() == null ? "" : name.get().strip();
        session.jobs().run("Saving the fitted sphere", p -> {
            if (label.isEmpty()) {
                throw new org.cohesa.core.InvalidInputException("name", label, "give the material a name before saving it");
            }
            Material m = new Material(label, List.of(), MaterialKind.OTHER, r.sphere(), "fit of " + r.results() + " test results (Cohesa sphere fit, seed "
                    + FitOptions.DEFAULT_SEED + ")", String.format(Locale.ROOT, "fitted from %d test results: %d/%d dissolving inside, %d/%d non-dissolving outside",
                    r.results(), r.quality().goodInside(), r.quality().goodTotal(), r.quality().badOutside(), r.quality().badTotal()), true);
            try (Database db = session.openDatabase()) {
                MaterialRepository repo = new MaterialRepository(db);
                repo.add(m);
                return repo.all();
            }
        }, all -> {
            session.materials().setAll(all);
            session.jobs().say("Saved \"" + label + "\" as your own material.");
            if (then != null) {
                then.run();
            }
        }, err -> report.set(report.get() + "\nNot saved: " + err));
    }

    /** Every bad cell of the test table, re-read so the report can list them all. */
    private static String detail(String text, SolventLibrary library) {
        try {
            TestSeriesCsv.read("test results", new StringReader(text), library);
            return "";
        } catch (BadRowsException e) {
            StringBuilder b = new StringBuilder("\n");
            for (RowError r : e.errors()) {
                b.append("• ").append(r.describe()).append('\n');
            }
            return b.toString();
        } catch (Exception e) {
            return "";
        }
    }

    static String describe(FitResult r) {
        StringBuilder b = new StringBuilder();
        var c = r.sphere().centre();
        b.append(String.format(Locale.ROOT, "Fitted sphere: δD %.1f, δP %.1f, δH %.1f, R0 %.1f MPa½ from %d test results%n",
                c.dD(), c.dP(), c.dH(), r.sphere().r0(), r.results()));
        var q = r.quality();
        b.append(String.format(Locale.ROOT, "Good liquids inside: %d of %d · bad liquids outside: %d of %d%n", q.goodInside(), q.goodTotal(),
                q.badOutside(), q.badTotal()));
        var region = r.region();
        if (region != null) {
            // the likelihood fit: its region, the results least likely under it, and the notes (as the command line prints them)
            b.append(String.format(Locale.ROOT, "%.0f %% likelihood region: centres up to Ra %.1f MPa½ from the fitted one, R0 %s; %s%n",
                    region.level() * 100, region.centreRadius(), range(region.r0()), region.boundedNote()));
            var misfits = r.likelyMisfits();
            if (misfits.isEmpty()) {
                b.append("Likely misfits: none (no result has a probability below 0.10 under the fit).\n");
            } else {
                b.append("Likely misfits (check these results first):\n");
                for (ResultProbability m : misfits) {
                    b.append("  ").append(m.name()).append(": score ").append(Numbers.two(m.score())).append(", RED ").append(Numbers.two(m.red()))
                            .append(", probability of this result ").append(String.format(Locale.ROOT, "%.3f", m.probability())).append('\n');
                }
            }
            var near = r.probabilities().stream().filter(x -> x.nearSurface() && x.probability() < 0.5).toList();
            if (!near.isEmpty()) {
                b.append("Near the surface on the unexpected side (cannot be told from noise): ")
                        .append(String.join(", ", near.stream().map(ResultProbability::name).toList())).append('\n');
            }
        } else if (q.misfits().isEmpty()) {
            b.append("No misfits: every result is on its expected side.\n");
        } else {
            b.append("Misfits (on the wrong side of the surface):\n");
            for (Misfit m : q.misfits()) {
                b.append("  ").append(m.name()).append(": score ").append(Numbers.two(m.score())).append(", RED ").append(Numbers.two(m.red()))
                        .append('\n');
            }
        }
        var conf = r.confidence();
        if (conf != null) {
            if (region == null) {
                b.append(String.format(Locale.ROOT, "%.0f %% confidence (%d resamples): δD %s, δP %s, δH %s, R0 %s%n", conf.level() * 100,
                        conf.resamples(), range(conf.dD()), range(conf.dP()), range(conf.dH()), range(conf.r0())));
            } else {
                b.append(String.format(Locale.ROOT, "Region extent: δD %s, δP %s, δH %s, R0 %s%n", range(conf.dD()), range(conf.dP()),
                        range(conf.dH()), range(conf.r0())));
            }
            for (String w : conf.warnings()) {
                b.append("Warning: ").append(w).append('\n');
            }
        }
        for (String n : r.notes()) {
            b.append("Note: ").append(n).append('\n');
        }
        if (!r.nextTests().isEmpty()) {
            b.append("Next tests that would tighten the fit most:\n");
            for (NextTest t : r.nextTests()) {
                b.append("  ").append(t.name()).append(" (RED ").append(Numbers.two(t.red())).append("): ").append(t.reason()).append('\n');
            }
        }
        return b.toString();
    }

    private static String range(Interval i) {
        return i == null ? "–" : String.format(Locale.ROOT, "%.1f–%.1f", i.low(), i.high());
    }
}
