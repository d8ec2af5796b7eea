package org.cohesa.cli.records;

import org.cohesa.core.records.RecordStatus;
import picocli.CommandLine.Command;

/** {@code cohesa record approve ID}: Approve a record in review (final). */
@Command(name = "approve", description = "Approve a record in review (final).")
public final class RecordApproveCommand extends RecordStatusCommand {

    @Override
    protected RecordStatus next() {
        return RecordStatus.APPROVED;
    }
}
