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
        Path db = Path.of(args[0]);
        int count = Integer.parseInt(args[1]);
        String tag = args[2];
        try (Database d = Database.openWithoutSync(db)) {
            SolventLibrary library = new SolventRepository(d).library();
            RecordRepository repo = new RecordRepository(d);
            RecordDraft draft = RecordFixtures.draft(library, "writer " + tag, "toluene", "ethyl acetate:0.5,ethanol:0.5");
            System.out.println("ready");
            System.out.flush();
            int writes = 0;
            for (int i = 0; count < 0 || i < count; i++) {
                SubstitutionRecord r = repo.create(draft, "writer " + tag);
                writes++;
                System.out.println("committed " + writes);
                if (i % 2 == 1) {
                    repo.changeStatus(r.id(), RecordStatus.IN_REVIEW, "reviewer " + tag, "step " + i);
                    writes++;
                    System.out.println("committed " + writes);
                }
                System.out.flush();
            }
        }
    }
}
