package org.cohesa.cli.records;

import java.nio.file.Path;
import java.time.Clock;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.SqliteRegister;
import picocli.CommandLine.Option;

/** Base of the {@code record} commands: which register (and which key file) they work on. */
abstract class RecordSubcommand extends CohesaSubcommand {

    @Option(names = "--key", paramLabel = "FILE",
            description = "Register key file (default: $COHESA_REGISTER_KEY, else register.key in the data folder; created on the first write).")
    Path keyFile;

    private RecordRepository repository;

    /** The register this run works on, opened once. */
    protected RecordRepository repo() {
        if (repository == null) {
            repository = new RecordRepository(new SqliteRegister(ctx().database()), Clock.systemUTC(), keyFile);
        }
        return repository;
    }
}
