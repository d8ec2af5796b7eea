package org.cohesa.cli.records;

import java.time.Clock;
import org.cohesa.cli.Output;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.RegisterKey;
import org.cohesa.store.PostgresRegister;
import org.cohesa.store.RecordRepository;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code cohesa record copy --to postgresql://HOST/DB}: moves the local register to an empty shared one, event for
 * event (same hashes, accounts, times and HMACs), checking the chain before and after.
 */
@Command(name = "copy", description = "Copy the local register into an empty shared register on PostgreSQL, checked before and after."
        + " The copy keeps every event as it is (hashes, accounts, times, seals); give the shared register the same key file.")
public final class RecordCopyCommand extends RecordSubcommand {

    @Option(names = "--to", required = true, paramLabel = "postgresql://HOST/DB", description = "The shared register to copy into (must be empty).")
    String to;

    /** What was copied. */
    record Json(String from, String to, long events, long records, String head_hash, boolean intact_before, boolean intact_after,
                String key_id) {
    }

    @Override
    protected void run() {
        if (!PostgresRegister.isAddress(to)) {
            throw new InvalidInputException("--to", to, "a shared register is written postgresql://HOST[:PORT]/DATABASE");
        }
        RecordRepository source = localRepo();
        RegisterKey key = source.key().orElse(null);
        ChainReport before = source.verify(key, null);
        if (!before.intact()) {
            throw new InvalidInputException("register", source.register().location(), "is broken (" + before.firstProblem().orElseThrow().describe()
                    + "); a damaged register is not copied. Run cohesa record verify");
        }
        try (PostgresRegister target = PostgresRegister.open("--to", to)) {
            RecordRepository shared = new RecordRepository(target, Clock.systemUTC(), keyFile);
            long copied = shared.copyFrom(source, key);
            ChainReport after = shared.verify(key, org.cohesa.core.records.Anchor.ofHash(before.headHash()));
            boolean same = after.intact() && after.events() == before.events() && after.headHash().equals(before.headHash());
            String sealId = shared.sealId(key).orElse(null);
            if (json()) {
                Output.json(out(), new Json(source.register().location(), target.location(), copied, after.records(), after.headHash(),
                        before.intact(), same, sealId));
            } else {
                out().println("Copied " + copied + " events (" + after.records() + " records) from " + source.register().location() + " to "
                        + target.location() + ".");
                out().println("Before: chain intact, head " + before.headHash() + ". After: " + (same ? "chain intact, same head." : "PROBLEM: "
                        + after.firstProblem().map(p -> p.describe()).orElse("different head " + after.headHash())));
                out().println("From now on use --register " + to + (shared.sealedByServer()
                        ? " (the server holds its secret and sealed the copy with it, key " + sealId + "; no key file is needed)"
                        : key == null ? "" : " with the same key file (key " + key.id() + ")") + ".");
            }
            if (!same) {
                throw new org.cohesa.store.StoreException("the copy in " + target.location() + " does not verify; do not use it");
            }
        }
    }
}
