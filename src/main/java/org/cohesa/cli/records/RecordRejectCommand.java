package org.cohesa.cli.records;

import org.cohesa.core.records.RecordStatus;
import picocli.CommandLine.Command;

/** {@code cohesa record reject ID}: Reject a record in review (final). */
@Command(name = "reject", description = "Reject a record in review (final).")
public final class RecordRejectCommand extends RecordStatusCommand {

    @Override
    protected RecordStatus next() {
        return RecordStatus.REJECTED;
    }
}
