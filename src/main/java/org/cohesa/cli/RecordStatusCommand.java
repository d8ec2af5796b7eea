package org.cohesa.cli;

import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.store.RecordRepository;

/** Shared body of review / approve / reject: one status step, refused when illegal. */
abstract class RecordStatusCommand extends CohesaSubcommand {

    protected abstract String idText();

    protected abstract String by();

    protected abstract String comment();

    protected abstract RecordStatus next();

    @Override
    protected void execute() {
        long id = RecordSupport.parseId(idText());
        if (next() != RecordStatus.IN_REVIEW && (comment() == null || comment().isBlank())) {
            throw new org.cohesa.core.InvalidInputException("--comment", String.valueOf(comment()), "a decision needs a comment saying why");
        }
        SubstitutionRecord r = new RecordRepository(ctx().database()).changeStatus(id, next(), by(), comment());
        if (json()) {
            Output.json(out(), RecordView.json(r, false));
            return;
        }
        out().println("Record " + r.id() + " is now " + r.status().label() + " (" + by().strip() + ").");
    }
}
