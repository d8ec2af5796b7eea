package org.cohesa.cli.library;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.file.Path;
import org.cohesa.core.records.ChainReport;
import org.cohesa.store.Database;
import org.cohesa.store.RecordRepository;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code cohesa backup FILE}: a consistent copy of the database, safe while the app is in use. */
@Command(name = "backup", description = "Write a consistent copy of the database to FILE (safe while Cohesa is running), then check the copy.")
public final class BackupCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "FILE", description = "New file for the copy (must not exist).")
    Path file;

    @Override
    protected void execute() {
        ctx().database().backupTo(file);
        ChainReport copyChain;
        try (Database copy = Database.openWithoutSync(file)) {
            copyChain = new RecordRepository(copy).verify();
        }
        if (json()) {
            Output.json(out(), new BackupResult(file.toString(), copyChain.events(), copyChain.records(), copyChain.intact(),
                    copyChain.headHash()));
            return;
        }
        out().println("Backed up to " + file + ": " + copyChain.records() + " records, " + copyChain.events()
                + " events, chain " + (copyChain.intact() ? "intact" : "BROKEN (run cohesa record verify)") + ".");
    }

    /** What {@code backup --json} prints: the copy and the state of its register chain, as checked after copying. */
    record BackupResult(
            String file,
            @JsonProperty("record_events") long recordEvents,
            long records,
            @JsonProperty("chain_intact") boolean chainIntact,
            @JsonProperty("head_hash") String headHash) {
    }
}
