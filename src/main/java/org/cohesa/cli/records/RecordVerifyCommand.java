package org.cohesa.cli.records;

import java.nio.file.Files;
import org.cohesa.cli.CohesaCommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;
import org.cohesa.core.records.Anchor;
import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.RegisterKey;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code cohesa record verify [--anchor HASH|FILE]}: checks the SHA-256 chain, the HMACs under the register key, the
 * status moves and, with an anchor, that the state kept elsewhere is still in the register. Exit 1 when anything is wrong.
 */
@Command(name = "verify", description = "Check the register: SHA-256 chain, HMAC seal under the register key, legal status moves, and"
        + " with --anchor the state kept elsewhere. Says what it could not detect. Exit 1 when a record was altered, deleted, reordered,"
        + " forged or moved illegally.")
public final class RecordVerifyCommand extends RecordSubcommand {

    @Option(names = "--anchor", paramLabel = "HASH|FILE", description = "A head hash (64 hex digits) or a file written by 'record anchor'.")
    String anchor;

    private boolean broken;

    @Override
    protected void run() {
        Anchor a = anchor == null ? null : AnchorFile.parse("--anchor", anchor);
        boolean byServer = repo().sealedByServer();
        RegisterKey key = byServer ? null : repo().key().orElse(null);
        ChainReport report = repo().verify(key, a);
        String sealId = repo().sealId(key).orElse(null);
        boolean guards = repo().guardsInPlace();
        broken = !report.intact();
        String where = repo().register().kind() + " " + repo().register().location();
        if (json()) {
            Output.json(out(), RecordJson.Verify.of(report, where, guards, sealId));
            return;
        }
        if (report.intact()) {
            out().println("Register intact (" + where + "): " + report.events() + " events in " + report.records() + " records.");
            out().println("Head hash (keep a copy elsewhere, or run cohesa record anchor): " + report.headHash());
        } else {
            ChainProblem first = report.firstProblem().orElseThrow();
            out().println("REGISTER BROKEN (" + where + "): " + first.describe());
            TextTable t = new TextTable("position", "record", "step", "problem", "detail");
            for (ChainProblem p : report.problems()) {
                t.row(p.position(), p.recordId(), p.seq(), p.kind().label(), p.detail());
            }
            t.print(out());
        }
        out().println("Checked: SHA-256 chain, head note, status moves"
                + (report.keyChecked() ? ", HMAC seal (" + (byServer ? "secret held by the server, key " : "key ") + sealId + ", "
                        + report.sealedEvents() + " sealed events)" : "")
                + (report.anchorChecked() ? ", anchor (" + report.sinceAnchor() + " events since)" : "") + ".");
        for (String limit : report.limits()) {
            out().println("not detectable in this run: " + limit);
        }
        if (!byServer && key == null && Files.notExists(repo().keyFile())) {
            out().println("(no key file at " + repo().keyFile() + ")");
        }
        if (!guards) {
            out().println("warning: the append-only guards on the record table were removed from the database.");
        }
    }

    @Override
    protected int exitCode() {
        return broken ? CohesaCommand.EXIT_FAILURE : 0;
    }
}
