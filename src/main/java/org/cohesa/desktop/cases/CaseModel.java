package org.cohesa.desktop.cases;

import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.collections.ObservableMap;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.cases.CaseProgress;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.cases.SubstitutionCase.CaseMaterial;
import org.cohesa.core.cases.SubstitutionCase.ChosenCandidate;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.desktop.records.RecordsModel;
import org.cohesa.store.CaseRepository;
import org.cohesa.store.Database;

/**
 * View-model of the case: the open {@link SubstitutionCase}, the list of saved ones, and what ties the case to the
 * screens. Picking a material (or a fit) sets the case's material, a search stores its limits and candidates, "Choose
 * for checks" adds candidates, the checks run off the FX thread with progress and cancel, filing the record stores its
 * number. Every change is saved at once, in order, on a writer thread of its own (one transaction per save), so the status
 * bar keeps saying what the user's own work did.
 */
public final class CaseModel {

    private final Session session;
    private final BlendModel blends;
    private final RecordsModel records;
    private final Clock clock;
    private final ObjectProperty<SubstitutionCase> current = new SimpleObjectProperty<>();
    private final ReadOnlyObjectWrapper<SubstitutionCase> stored = new ReadOnlyObjectWrapper<>();
    private final ObservableList<CaseRepository.Summary> saved = FXCollections.observableArrayList();
    private final ObservableMap<String, CandidateChecks> checks = FXCollections.observableHashMap();
    private final ExecutorService writer = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "cohesa-case-writer");
        t.setDaemon(true);
        return t;
    });
    private boolean applying;
    private final javafx.beans.property.ReadOnlyBooleanWrapper limitsChanged = new javafx.beans.property.ReadOnlyBooleanWrapper();
    private final javafx.beans.binding.ObjectBinding<List<CaseProgress.State>> progress;

    public CaseModel(Session session, BlendModel blends, RecordsModel records, Clock clock) {
        this.session = session;
        this.blends = blends;
        this.records = records;
        this.clock = clock;
        session.targetProperty().addListener((o, a, t) -> {
            if (current.get() != null && !applying && t != null) {
                change(current.get().withMaterial(CaseMaterial.of(t.name(), t.source(), t.sphere())));
                checks.clear();
            }
        });
        blends.rows().addListener((javafx.collections.ListChangeListener<BlendModel.Row>) ch -> {
            if (current.get() != null && !blends.rows().isEmpty() && current.get().material() != null) {
                List<String> found = blends.rows().stream().map(r -> r.blend().describe()).toList();
                change(current.get().withSearch(blends.limits(), found));
                checks.keySet().retainAll(found);
            }
        });
        // the Limits step is open again as soon as the form no longer holds the limits the candidates were found with
        List<javafx.beans.Observable> form = new ArrayList<>(List.of(blends.maxComponents, blends.top, blends.rankBy, blends.process,
                blends.include, blends.exclude, blends.fixed, blends.minFractionPercent, blends.boilingMin, blends.boilingMax,
                blends.minFlashPoint, blends.maxIchClass, blends.noCmr, blends.maxCost, blends.redLimit, blends.temperatureC,
                blends.families, blends.excludeFamilies, blends.withWater, blends.minBlendFlash, blends.allowIchClass1, blends.reactiveAsReplaced, current));
        form.addAll(blends.excludeReactive.values());
        form.addAll(blends.replacedBecause.values());
        javafx.beans.InvalidationListener recheck = o -> limitsChanged.set(differs(current.get(), blends.limits()));
        form.forEach(x -> x.addListener(recheck));
        progress = javafx.beans.binding.Bindings.createObjectBinding(() -> current.get() == null ? List.of()
                : CaseProgress.of(current.get(), new CaseProgress.Facts(limitsChanged.get(), recordStatus())), current, limitsChanged, records.records());
    }

    /** True when the case has searched and a limit it searched with now reads differently in the form. */
    static boolean differs(SubstitutionCase c, Map<String, String> form) {
        if (c == null || c.limits().isEmpty()) {
            return false;
        }
        for (Map.Entry<String, String> e : form.entrySet()) {
            String was = c.limits().get(e.getKey());
            if (was != null && !was.strip().equals(e.getValue() == null ? "" : e.getValue().strip())) {
                return true;
            }
        }
        return false;
    }

    /** Whether the form's limits differ from those the case's candidates were found with. */
    public javafx.beans.property.ReadOnlyBooleanProperty limitsChangedProperty() {
        return limitsChanged.getReadOnlyProperty();
    }

    /** The status of the case's record as the register read last holds it, or null (none filed, or not in this register). */
    public org.cohesa.core.records.RecordStatus recordStatus() {
        SubstitutionCase c = current.get();
        if (c == null || c.recordId() == null) {
            return null;
        }
        return records.records().stream().filter(r -> r.id() == c.recordId()).findFirst()
                .map(org.cohesa.core.records.SubstitutionRecord::status).orElse(null);
    }

    /** What each step has done or misses, kept up to date with the case, the limits form and the register. */
    public javafx.beans.binding.ObjectBinding<List<CaseProgress.State>> progressBinding() {
        return progress;
    }

    public Session session() {
        return session;
    }

    public BlendModel blends() {
        return blends;
    }

    public RecordsModel records() {
        return records;
    }

    /** The open case, or null on the start page. */
    public ObjectProperty<SubstitutionCase> currentProperty() {
        return current;
    }

    public SubstitutionCase current() {
        return current.get();
    }

    /** The case as last written to the database (tests wait for it; the title bar could show "saved"). */
    public ReadOnlyObjectProperty<SubstitutionCase> storedProperty() {
        return stored.getReadOnlyProperty();
    }

    public ObservableList<CaseRepository.Summary> saved() {
        return saved;
    }

    /** Full check results of the chosen candidates this session, by blend notation. */
    public ObservableMap<String, CandidateChecks> checks() {
        return checks;
    }

    public List<CaseProgress.State> progress() {
        return progress.get();
    }

    /** Reads the list of saved cases. */
    public void refreshList(Runnable then) {
        session.jobs().run("Reading the saved cases", p -> {
            try (Database db = session.openDatabase()) {
                return new CaseRepository(db).list();
            }
        }, list -> {
            saved.setAll(list);
            if (then != null) {
                then.run();
            }
        });
    }

    /**
     * Starts a case and makes it the open one: the screens are cleared for it (no target, no candidates).
     *
     * @throws InvalidInputException naming the field when the header is not valid
     */
    public void start(String title, SubstitutionCase.Kind kind, String replaced, String process) {
        SubstitutionCase c = SubstitutionCase.start(title, kind, replaced, process, clock.instant());
        if (kind == SubstitutionCase.Kind.REPLACE) {
            new SolventLibrary(List.copyOf(session.solvents())).resolveBlend("replaced liquid",
                    c.replaced().contains(":") ? c.replaced() : c.replaced() + ":1");
        }
        applying = true;
        try {
            current.set(c);
            checks.clear();
            session.replacingProperty().set(c.replaced());
            session.targetProperty().set(null);
        } finally {
            applying = false;
        }
        save();
        session.jobs().say("Case “" + c.title() + "” started: pick the material next.");
    }

    /** Opens a saved case: its material becomes the target, its limits fill the form and its search runs again. */
    public void open(long id, Runnable then) {
        session.jobs().run("Opening the case", p -> {
            try (Database db = session.openDatabase()) {
                return new CaseRepository(db).find(id)
                        .orElseThrow(() -> new InvalidInputException("case", String.valueOf(id), "no such case in this database"));
            }
        }, c -> {
            applying = true;
            try {
                current.set(c);
                stored.set(c);
                checks.clear();
                session.replacingProperty().set(c.replaced());
                session.targetProperty().set(c.material() == null ? null
                        : new TargetChoice(c.material().name(), c.material().sphere(), c.material().source()));
                if (!c.limits().isEmpty()) {
                    blends.applyLimits(c.limits());
                }
            } finally {
                applying = false;
            }
            // the cards are computed, not stored: the same limits give the same candidates again
            if (c.material() != null && !c.limits().isEmpty()) {
                try {
                    blends.search(() -> {
                        if (!current.get().chosen().isEmpty()) {
                            runChecks(then);
                        } else if (then != null) {
                            then.run();
                        }
                    });
                } catch (RuntimeException e) {
                    session.jobs().complain(ErrorText.of(e));
                }
            } else if (then != null) {
                then.run();
            }
        });
    }

    /** Edits the case's title, kind, replaced liquid and process. */
    public void editHeader(String title, SubstitutionCase.Kind kind, String replaced, String process) {
        SubstitutionCase c = current.get().withHeader(title, kind, replaced, process);
        session.replacingProperty().set(c.replaced());
        change(c);
    }

    /** Deletes a saved case (its filed record stays in the register). */
    public void delete(long id, Runnable then) {
        session.jobs().run("Deleting the case", p -> {
            try (Database db = session.openDatabase()) {
                new CaseRepository(db).delete(id);
                return new CaseRepository(db).list();
            }
        }, list -> {
            saved.setAll(list);
            if (current.get() != null && current.get().id() == id) {
                current.set(null);
            }
            if (then != null) {
                then.run();
            }
        });
    }

    /** Takes candidates further to the checks. */
    public void choose(List<BlendModel.Row> rows) {
        SubstitutionCase c = requireCase();
        for (BlendModel.Row r : rows) {
            c = c.choose(r.blend().describe(), r.suggestion().blend().red());
        }
        change(c);
        session.jobs().say(c.chosen().size() + " candidate" + (c.chosen().size() == 1 ? "" : "s") + " chosen for the checks.");
    }

    public void unchoose(String blend) {
        checks.remove(blend);
        change(requireCase().unchoose(blend));
    }

    /** Runs the safety, drying and phase checks of every chosen candidate off the FX thread (progress, cancel). */
    public void runChecks(Runnable then) {
        SubstitutionCase c = requireCase();
        if (c.chosen().isEmpty()) {
            throw new InvalidInputException("checks", "", "choose at least one candidate first (Candidates step: Choose for checks)");
        }
        SolventLibrary library = new SolventLibrary(List.copyOf(session.solvents()));
        var target = c.material() == null ? null : c.material().sphere();
        double kelvin = temperatureK();
        List<String> blendsToCheck = c.chosen().stream().map(ChosenCandidate::blend).toList();
        session.jobs().run("Checking " + blendsToCheck.size() + " chosen candidate" + (blendsToCheck.size() == 1 ? "" : "s"), p -> {
            Map<String, CandidateChecks> out = new LinkedHashMap<>();
            int i = 0;
            for (String b : blendsToCheck) {
                if (p.isCancelled()) {
                    return null;
                }
                p.update(i / (double) blendsToCheck.size(), "Checking " + b + " (safety, drying, phases)…");
                out.put(b, CandidateChecks.run(parse(library, b), target, kelvin, library.all()));
                i++;
            }
            return out;
        }, out -> {
            if (out == null) {
                return;
            }
            checks.putAll(out);
            SubstitutionCase now = current.get();
            for (Map.Entry<String, CandidateChecks> e : out.entrySet()) {
                for (ChosenCandidate cc : now.chosen()) {
                    if (cc.blend().equals(e.getKey())) {
                        now = now.update(cc.withSafety(e.getValue().safetyLine()).withDrying(e.getValue().dryingLine())
                                .withMiscibility(e.getValue().phaseLine()));
                    }
                }
            }
            change(now);
            if (then != null) {
                then.run();
            }
        });
    }

    /** Files the substitution record for the case and keeps its number. */
    public void fileRecord(RecordsModel.Filing f, Runnable then) {
        SubstitutionCase c = requireCase();
        if (c.recordId() != null) {
            throw new InvalidInputException("record", String.valueOf(c.recordId()), "this case already filed record " + c.recordId()
                    + "; start a new case for another substitution");
        }
        records.file(f, r -> {
            if (current.get() != null && current.get().id() == c.id()) {
                change(current.get().withRecord(r.id()));
            }
            if (then != null) {
                then.run();
            }
        });
    }

    /** "acetone:0.3,ethanol:0.7" → "acetone 30 % + ethanol 70 %" (the notation itself when the library cannot read it). */
    public String percentText(String blend) {
        try {
            Blend b = parse(new SolventLibrary(List.copyOf(session.solvents())), blend);
            return String.join(" + ", b.components().stream().map(c -> c.solvent().name() + " " + Math.round(c.fraction() * 100) + " %").toList());
        } catch (RuntimeException e) {
            return blend;
        }
    }

    static Blend parse(SolventLibrary library, String text) {
        return text.contains(":") ? library.resolveBlend("candidate", text) : Blend.pure(library.resolve("candidate", text));
    }

    private double temperatureK() {
        try {
            return Double.parseDouble(blends.temperatureC.get().strip()) + 273.15;
        } catch (RuntimeException e) {
            return 298.15;
        }
    }

    private SubstitutionCase requireCase() {
        if (current.get() == null) {
            throw new InvalidInputException("case", "", "start or open a case first (Cases)");
        }
        return current.get();
    }

    private void change(SubstitutionCase next) {
        if (next.equals(current.get())) {
            return;
        }
        current.set(next);
        save();
    }

    /** Writes the open case; a new case gets its number back on the FX thread. */
    private void save() {
        SubstitutionCase c = current.get();
        Instant now = clock.instant();
        writer.submit(() -> {
            try (Database db = session.openDatabase()) {
                // a change made before the first write of a new case came back goes to the row that write created
                SubstitutionCase toSave = c.id() == 0 && c.created().equals(newCaseCreated) ? c.withId(newCaseId, c.updated()) : c;
                SubstitutionCase s = new CaseRepository(db).save(toSave, now);
                if (c.id() == 0) {
                    newCaseCreated = c.created();
                    newCaseId = s.id();
                }
                Platform.runLater(() -> {
                    stored.set(s);
                    SubstitutionCase open = current.get();
                    if (c.equals(open)) {
                        current.set(s); // nothing changed meanwhile: the open case is the stored one (number, time saved)
                    } else if (open != null && open.id() == 0 && open.created().equals(c.created())) {
                        current.set(open.withId(s.id(), open.updated())); // the next save overwrites this row
                    }
                });
            } catch (RuntimeException e) {
                session.jobs().complain("The case could not be saved: " + ErrorText.of(e));
            }
        });
    }

    // touched on the writer thread only
    private Instant newCaseCreated;
    private long newCaseId;

    /** The chosen candidates in case order, with their checks. */
    public List<ChosenCandidate> chosen() {
        return current.get() == null ? List.of() : new ArrayList<>(current.get().chosen());
    }
}
