package org.cohesa.cli.records;

import org.cohesa.core.records.RecordStatus;
import picocli.CommandLine.Command;

/** {@code cohesa record review ID}: Take a draft into review. */
@Command(name = "review", description = "Take a draft into review.")
public final class RecordReviewCommand extends RecordStatusCommand {

    @Override
    protected RecordStatus next() {
        return RecordStatus.IN_REVIEW;
    }
}
