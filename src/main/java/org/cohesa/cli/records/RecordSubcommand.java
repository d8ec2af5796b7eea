package org.cohesa.cli.records;

import java.nio.file.Path;
import java.time.Clock;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.store.PostgresRegister;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.SqliteRegister;
import picocli.CommandLine.Option;

/**
 * Base of the {@code record} commands: which register they work on (the local database, or a shared PostgreSQL
 * register with {@code --register} or {@code $COHESA_REGISTER}) and which key file seals it.
 */
abstract class RecordSubcommand extends CohesaSubcommand {

    @Option(names = "--register", paramLabel = "postgresql://HOST/DB",
            description = "A shared register on a PostgreSQL server (default: $COHESA_REGISTER, else the local database).")
    String register;

    @Option(names = "--key", paramLabel = "FILE",
            description = "Register key file (default: $COHESA_REGISTER_KEY, else register.key in the data folder; a new register creates it).")
    Path keyFile;

    private RecordRepository repository;
    private PostgresRegister shared;

    /** The register this run works on, opened once. */
    protected RecordRepository repo() {
        if (repository == null) {
            String address = register != null ? register : System.getenv("COHESA_REGISTER");
            if (address != null && !address.isBlank()) {
                shared = PostgresRegister.open(register != null ? "--register" : "COHESA_REGISTER", address.strip());
                repository = new RecordRepository(shared, Clock.systemUTC(), keyFile);
            } else {
                repository = new RecordRepository(new SqliteRegister(ctx().database()), Clock.systemUTC(), keyFile);
            }
        }
        return repository;
    }

    /** The local register, whatever --register says (the source of {@code record copy}). */
    protected RecordRepository localRepo() {
        return new RecordRepository(new SqliteRegister(ctx().database()), Clock.systemUTC(), keyFile);
    }

    /** Runs the command, then closes a shared register's connection. */
    @Override
    protected final void execute() throws Exception {
        try {
            run();
        } finally {
            if (shared != null) {
                shared.close();
            }
        }
    }

    protected abstract void run() throws Exception;
}
