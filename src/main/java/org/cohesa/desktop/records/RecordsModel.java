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
import org.cohesa.store.PostgresRegister;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.SourceCatalog;

/**
 * View-model of the register screen: the substitution records, filing a new one (with its evidence snapshot),
 * moving it through review, verifying the hash chain and exporting (PDF per record, CSV register). The register is the
 * local database's or a shared one on PostgreSQL ({@code $COHESA_REGISTER} at start, or chosen on the screen); every
 * piece of work opens it on a worker thread, never on the FX thread. The register itself lives in
 * {@link RecordRepository}, which holds the four-eyes rule against the account at the keyboard.
 */
public final class RecordsModel {

    /**
     * Which register the screen works on and who is at the keyboard, as the register sees it.
     *
     * @param kind        "sqlite" or "postgresql"
     * @param location    the file or the server address (never a password)
     * @param account     the account the register records for this person (OS account, or database login)
     * @param login       true when {@code account} is a database login (vouched for by the server)
     * @param seal        what seals the chain, in words
     * @param fourEyes    whether the four-eyes rule is on
     * @param events      events in the register
     */
    public record RegisterInfo(String kind, String location, String account, boolean login, String seal, boolean fourEyes,
                               long events) {

        /** One line for the screen. */
        public String describe() {
            return ("postgresql".equals(kind) ? "Shared register " : "Local register ") + location + " · you: " + account
                    + (login ? " (database login)" : " (operating-system account)") + " · four eyes " + (fourEyes ? "on" : "off")
                    + " · " + seal;
        }
    }

    private final javafx.beans.property.ObjectProperty<String> sharedAddress = new javafx.beans.property.SimpleObjectProperty<>();
    private final javafx.beans.property.ObjectProperty<RegisterInfo> info = new javafx.beans.property.SimpleObjectProperty<>();
    /** The address as worker threads read it (the property is the FX thread's). */
    private volatile String address;

    /** What the user typed into the filing form. */
    public record Filing(String process, String site, String replaced, String replacement, String reason, String author,
                         boolean withTarget) {
    }

    private final Session session;
    private final ObservableList<SubstitutionRecord> records = FXCollections.observableArrayList();

    public RecordsModel(Session session) {
        this.session = session;
        String env = System.getenv("COHESA_REGISTER");
        if (env != null && PostgresRegister.isAddress(env.strip())) {
            sharedAddress.set(env.strip());
        }
        address = sharedAddress.get();
        sharedAddress.addListener((o, a, b) -> address = b);
    }

    /** The shared register's address, or null for the local database's register. */
    public javafx.beans.property.ReadOnlyObjectProperty<String> sharedAddressProperty() {
        return sharedAddress;
    }

    /** Which register is shown and who is at the keyboard (null until the first reload). */
    public javafx.beans.property.ReadOnlyObjectProperty<RegisterInfo> infoProperty() {
        return info;
    }

    /**
     * Switches to the shared register at {@code address} (null or blank: the local one), after opening it on a worker
     * thread; a register that cannot be opened is named in the status bar and the screen stays on the one it had.
     */
    public void useRegister(String address, Runnable then) {
        String chosen = address == null || address.isBlank() ? null : address.strip();
        session.jobs().run(chosen == null ? "Opening the local register" : "Connecting to the shared register", p -> {
            try (Opened o = open(chosen)) {
                return describe(o.repo());
            }
        }, i -> {
            sharedAddress.set(chosen);
            info.set(i);
            reload(then);
        });
    }

    /** An open register for one piece of work on a worker thread. */
    private record Opened(RecordRepository repo, AutoCloseable resource) implements AutoCloseable {
        @Override
        public void close() throws Exception {
            resource.close();
        }
    }

    private Opened open(String address) {
        if (address != null) {
            PostgresRegister shared = PostgresRegister.open("register", address);
            return new Opened(new RecordRepository(shared, java.time.Clock.systemUTC(), null), shared);
        }
        Database db = session.openDatabase();
        return new Opened(new RecordRepository(db), db);
    }

    private Opened open() {
        return open(address);
    }

    private static RegisterInfo describe(RecordRepository repo) {
        var register = repo.register();
        String seal;
        if (repo.sealedByServer()) {
            seal = "sealed by the server's secret (key " + register.serverSecretId() + ")";
        } else {
            seal = repo.key().map(k -> "sealed with key file " + repo.keyFile() + " (key " + k.id() + ")")
                    .orElse("no key file yet at " + repo.keyFile() + " (the first write creates it)");
        }
        return new RegisterInfo(register.kind(), register.location(), register.account(), register.accountIsAuthenticated(), seal,
                repo.fourEyes().on(), repo.head().events());
    }

    public Session session() {
        return session;
    }

    public ObservableList<SubstitutionRecord> records() {
        return records;
    }

    public void reload(Runnable then) {
        session.jobs().run("Reading the register", p -> {
            try (Opened o = open()) {
                return new Reading(o.repo().all(), describe(o.repo()));
            }
        }, read -> {
            records.setAll(read.records());
            info.set(read.info());
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
            try (Opened o = open()) {
                return o.repo().create(draft, required("author", f.author()));
            }
        }, r -> reload(() -> {
            session.jobs().say("Filed record " + r.id() + " as a draft.");
            if (then != null) {
                then.accept(r);
            }
        }));
    }

    public void changeStatus(long id, RecordStatus next, String by, String comment, Runnable then) {
        changeStatus(id, next, by, comment, then, null);
    }

    /**
     * Takes record {@code id} to {@code next} on a worker thread. The register holds the rules (the moves, four eyes
     * against the account at the keyboard); a refused step writes nothing and its one-line reason goes to the status bar
     * and to {@code refused} (on the FX thread).
     */
    public void changeStatus(long id, RecordStatus next, String by, String comment, Runnable then,
            java.util.function.Consumer<String> refused) {
        session.jobs().run("Recording the decision on record " + id, p -> {
            try (Opened o = open()) {
                return o.repo().changeStatus(id, next, required("by", by), comment);
            }
        }, r -> reload(() -> {
            session.jobs().say("Record " + id + " is now " + r.status().label().replace('_', ' ') + ".");
            if (then != null) {
                then.run();
            }
        }), refused);
    }

    /** Walks the hash chain; the status bar says whether it is intact or names the first problem. */
    public void verify(java.util.function.Consumer<ChainReport> then) {
        session.jobs().run("Verifying the register", p -> {
            try (Opened o = open()) {
                return o.repo().verify();
            }
        }, report -> {
            if (report.intact()) {
                session.jobs().say("Register intact: " + report.events() + " events in " + report.records() + " records"
                        + (report.keyChecked() ? ", seals checked" : ", seals not checked (no key)") + ", head hash " + report.headHash());
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
            try (Opened o = open()) {
                RecordRepository repo = o.repo();
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
            try (Opened o = open()) {
                List<SubstitutionRecord> all = o.repo().all();
                writeAtomically(file, tmp -> {
                    try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                        RegisterCsv.write(all, w);
                    }
                });
            }
            return file;
        }, f -> session.jobs().say("Saved " + f));
    }

    private record Reading(List<SubstitutionRecord> records, RegisterInfo info) {
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
