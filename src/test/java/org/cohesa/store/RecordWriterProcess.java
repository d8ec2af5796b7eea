package org.cohesa.store;

import java.nio.file.Path;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.solvent.SolventLibrary;

/**
 * A separate JVM for the crash and concurrency tests: files records (and moves every second one into
 * review) in a loop, printing "committed N" after each committed write. Args: DB COUNT TAG (COUNT &lt; 0: until killed).
 */
public final class RecordWriterProcess {

    private RecordWriterProcess() {
    }

    public static void main(String[] args) {
        int count = Integer.parseInt(args[1]);
        String tag = args[2];
        if (PostgresRegister.isAddress(args[0])) {
            // a shared register: args[3] is a local database that only supplies the solvent library for the drafts
            try (Database d = Database.openWithoutSync(Path.of(args[3])); PostgresRegister shared = PostgresRegister.open("register", args[0])) {
                SolventLibrary library = new SolventRepository(d).library();
                RecordRepository one = new RecordRepository(shared, java.time.Clock.systemUTC(), null);
                write(one, one, library, count, tag);
            }
            return;
        }
        Path db = Path.of(args[0]);
        try (Database d = Database.openWithoutSync(db)) {
            SolventLibrary library;
            if (args.length > 3) {
                // the register file holds no solvents: the library comes from args[3]
                try (Database lib = Database.openWithoutSync(Path.of(args[3]))) {
                    library = new SolventRepository(lib).library();
                }
            } else {
                library = new SolventRepository(d).library();
            }
            // two people at one process: the author's and the reviewer's operating-system accounts (four eyes)
            write(new RecordRepository(new SqliteRegister(d, "author-" + tag), java.time.Clock.systemUTC(), null),
                    new RecordRepository(new SqliteRegister(d, "reviewer-" + tag), java.time.Clock.systemUTC(), null), library, count, tag);
        }
    }

    private static void write(RecordRepository repo, RecordRepository reviewer, SolventLibrary library, int count, String tag) {
        {
            RecordDraft draft = RecordFixtures.draft(library, "writer " + tag, "toluene", "ethyl acetate:0.5,ethanol:0.5");
            System.out.println("ready");
            System.out.flush();
            int writes = 0;
            for (int i = 0; count < 0 || i < count; i++) {
                SubstitutionRecord r = repo.create(draft, "writer " + tag);
                writes++;
                System.out.println("committed " + writes);
                if (i % 2 == 1) {
                    reviewer.changeStatus(r.id(), RecordStatus.IN_REVIEW, "reviewer " + tag, "step " + i);
                    writes++;
                    System.out.println("committed " + writes);
                }
                System.out.flush();
            }
        }
    }
}
