package org.cohesa.cli.library;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
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
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("file", file.toString());
            m.put("record_events", copyChain.events());
            m.put("records", copyChain.records());
            m.put("chain_intact", copyChain.intact());
            m.put("head_hash", copyChain.headHash());
            Output.json(out(), m);
            return;
        }
        out().println("Backed up to " + file + ": " + copyChain.records() + " records, " + copyChain.events()
                + " events, chain " + (copyChain.intact() ? "intact" : "BROKEN (run cohesa record verify)") + ".");
    }
}
