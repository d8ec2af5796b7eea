package org.cohesa.cli.records;

import org.cohesa.cli.CohesaCommand;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.store.RecordRepository;
import picocli.CommandLine.Command;

/** {@code cohesa record verify}: walks the hash chain; exit 1 when a stored record was altered, deleted or reordered. */
@Command(name = "verify", description = "Check that no stored record was altered, deleted or reordered (SHA-256 hash chain). Exit 1 when one was.")
public final class RecordVerifyCommand extends CohesaSubcommand {

    private boolean broken;

    @Override
    protected void execute() {
        RecordRepository repo = new RecordRepository(ctx().database());
        ChainReport report = repo.verify();
        boolean guards = repo.guardsInPlace();
        broken = !report.intact();
        if (json()) {
            Output.json(out(), RecordView.json(report, guards));
            return;
        }
        if (report.intact()) {
            out().println("Chain intact: " + report.events() + " events in " + report.records() + " records.");
            out().println("Head hash (keep a copy elsewhere to anchor the chain): " + report.headHash());
        } else {
            ChainProblem first = report.firstProblem().orElseThrow();
            out().println("CHAIN BROKEN: record " + first.recordId() + " was " + first.kind().label() + " outside Cohesa.");
            TextTable t = new TextTable("position", "record", "step", "problem", "detail");
            for (ChainProblem p : report.problems()) {
                t.row(p.position(), p.recordId(), p.seq(), p.kind().label(), p.detail());
            }
            t.print(out());
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
