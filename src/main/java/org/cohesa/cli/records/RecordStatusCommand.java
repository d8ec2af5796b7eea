package org.cohesa.cli.records;

import org.cohesa.cli.Output;

import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Shared body of review / approve / reject: one status step, refused when illegal. The subclasses only
 * name the step; a decision (approve, reject) needs a comment, taking a draft into review does not.
 */
abstract class RecordStatusCommand extends RecordSubcommand {

    @Parameters(paramLabel = "ID", description = "Record number.")
    String id;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who takes this step.")
    String by;

    @Option(names = "--comment", paramLabel = "TEXT", description = "Why (required to approve or reject).")
    String comment;

    protected abstract RecordStatus next();

    @Override
    protected void run() {
        long recordId = RecordSupport.parseId(id);
        if (by == null || by.isBlank()) {
            throw new InvalidInputException("--by", by == null ? "" : by, "must name a person");
        }
        if (next() != RecordStatus.IN_REVIEW && (comment == null || comment.isBlank())) {
            throw comment == null
                    ? new InvalidInputException("--comment", "", "missing: a decision needs a comment saying why")
                    : new InvalidInputException("--comment", comment, "a decision needs a comment saying why");
        }
        SubstitutionRecord r = repo().changeStatus(recordId, next(), by, comment);
        if (json()) {
            Output.json(out(), RecordJson.Record.of(r, false));
            return;
        }
        out().println("Record " + r.id() + " is now " + r.status().label() + " (" + by.strip() + ").");
    }
}
