package org.cohesa.desktop.records;

import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.EvidenceAssembler;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.records.TargetRef;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.report.RecordPdf;
import org.cohesa.report.RegisterCsv;
import org.cohesa.store.Database;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.SourceCatalog;

/**
 * View-model of the register screen: the substitution records, filing a new one (with its evidence snapshot),
 * moving it through review, verifying the hash chain and exporting (PDF per record, CSV register). All work
 * runs off the FX thread; the register itself lives in {@link RecordRepository}.
 */
public final class RecordsModel {

    /** What the user typed into the filing form. */
    public record Filing(String process, String site, String replaced, String replacement, String reason, String author,
                         boolean withTarget) {
    }

    private final Session session;
    private final ObservableList<SubstitutionRecord> records = FXCollections.observableArrayList();

    public RecordsModel(Session session) {
        this.session = session;
    }

    public Session session() {
        return session;
    }

    public ObservableList<SubstitutionRecord> records() {
        return records;
    }

    public void reload(Runnable then) {
        session.jobs().run("Reading the register", p -> {
            try (Database db = session.openDatabase()) {
                return new RecordRepository(db).all();
            }
        }, list -> {
            records.setAll(list);
            if (then != null) {
                then.run();
            }
        });
    }

    /** Files a record as a draft; the evidence is the parameters, distances, safety profiles, drying path and sources at this moment. */
    /**
     * What the new-record form starts with: the liquid the case replaces (never whatever was last clicked in the
     * library: a click there is browsing, not a decision) and the blend chosen as its replacement.
     */
    public Filing startingFiling() {
        String replaced = session.replacingProperty().get() == null ? "" : session.replacingProperty().get();
        String replacement = session.selectedBlendProperty().get() == null ? "" : session.selectedBlendProperty().get().describe();
        return new Filing("", null, replaced, replacement, "", System.getProperty("user.name", ""), session.target() != null);
    }

    public void file(Filing f, java.util.function.Consumer<SubstitutionRecord> then) {
        SolventLibrary library = new SolventLibrary(List.copyOf(session.solvents()));
        TargetChoice target = f.withTarget() ? session.target() : null;
        session.jobs().run("Filing the record", p -> {
            Blend from = liquid(library, "replaced", f.replaced());
            Blend to = liquid(library, "replacement", f.replacement());
            String targetText = null;
            TargetRef ref = null;
            if (target != null) {
                var c = target.sphere().centre();
                targetText = c.dD() + "," + c.dP() + "," + c.dH() + "," + target.sphere().r0();
                ref = new TargetRef(target.name(), target.sphere(), target.source());
            }
            // the same evidence as the command line files: parameters, distances, safety profiles, drying path, sources
            var evidence = EvidenceAssembler.assemble(from, to, ref, SourceCatalog.bundled().all(), appVersion());
            RecordDraft draft = new RecordDraft(f.process(), f.site(), from.describe(), to.describe(), targetText, f.reason(),
                    evidence);
            try (Database db = session.openDatabase()) {
                return new RecordRepository(db).create(draft, required("author", f.author()));
            }
        }, r -> reload(() -> {
            session.jobs().say("Filed record " + r.id() + " as a draft.");
            if (then != null) {
                then.accept(r);
            }
        }));
    }

    public void changeStatus(long id, RecordStatus next, String by, String comment, Runnable then) {
        session.jobs().run("Recording the decision on record " + id, p -> {
            try (Database db = session.openDatabase()) {
                return new RecordRepository(db).changeStatus(id, next, required("by", by), comment);
            }
        }, r -> reload(() -> {
            session.jobs().say("Record " + id + " is now " + r.status().label().replace('_', ' ') + ".");
            if (then != null) {
                then.run();
            }
        }));
    }

    /** Walks the hash chain; the status bar says whether it is intact or names the first problem. */
    public void verify(java.util.function.Consumer<ChainReport> then) {
        session.jobs().run("Verifying the register", p -> {
            try (Database db = session.openDatabase()) {
                return new RecordRepository(db).verify();
            }
        }, report -> {
            if (report.intact()) {
                session.jobs().say("Register intact: " + report.events() + " events in " + report.records() + " records, head hash "
                        + report.headHash());
            } else {
                session.jobs().complain("Register altered: " + report.firstProblem().map(x -> x.describe()).orElse("see the report"));
            }
            if (then != null) {
                then.accept(report);
            }
        });
    }

    public void exportPdf(long id, Path file) {
        session.jobs().run("Writing the PDF of record " + id, p -> {
            try (Database db = session.openDatabase()) {
                RecordRepository repo = new RecordRepository(db);
                SubstitutionRecord r = repo.get(id);
                List<RecordEvent> events = repo.events(id);
                ChainReport chain = repo.verify();
                writeAtomically(file, tmp -> RecordPdf.write(r, events.get(events.size() - 1).hash(), chain, appVersion(), tmp));
            }
            return file;
        }, f -> session.jobs().say("Saved " + f));
    }

    public void exportCsv(Path file) {
        session.jobs().run("Writing the register as CSV", p -> {
            try (Database db = session.openDatabase()) {
                List<SubstitutionRecord> all = new RecordRepository(db).all();
                writeAtomically(file, tmp -> {
                    try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                        RegisterCsv.write(all, w);
                    }
                });
            }
            return file;
        }, f -> session.jobs().say("Saved " + f));
    }

    private interface FileWork {
        void write(Path tmp) throws java.io.IOException;
    }

    /** Writes beside the destination and moves into place, so a failed export never leaves half a file. */
    private static void writeAtomically(Path file, FileWork work) throws java.io.IOException {
        Path parent = file.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(parent, ".cohesa-export", ".tmp");
        try {
            work.write(tmp);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    static Blend liquid(SolventLibrary library, String field, String text) {
        String t = required(field, text);
        return t.contains(":") ? library.resolveBlend(field, t) : Blend.pure(library.resolve(field, t));
    }

    private static String required(String field, String text) {
        if (text == null || text.isBlank()) {
            throw new org.cohesa.core.InvalidInputException(field, "", "must not be empty");
        }
        return text.strip();
    }

    static String appVersion() {
        String v = RecordsModel.class.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }
}
