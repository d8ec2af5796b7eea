package org.cohesa.cli;

import org.cohesa.core.records.RecordStatus;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record review ID}: Take a draft into review. */
@Command(name = "review", description = "Take a draft into review.")
public final class RecordReviewCommand extends RecordStatusCommand {

    @Parameters(paramLabel = "ID", description = "Record number.")
    String id;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who takes this step.")
    String by;

    @Option(names = "--comment", required = false, paramLabel = "TEXT", description = "Why.")
    String comment;

    @Override
    protected String idText() {
        return id;
    }

    @Override
    protected String by() {
        return by;
    }

    @Override
    protected String comment() {
        return comment;
    }

    @Override
    protected RecordStatus next() {
        return RecordStatus.IN_REVIEW;
    }
}
