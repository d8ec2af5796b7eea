package org.cohesa.cli;

import org.cohesa.core.records.RecordStatus;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record reject ID}: Reject a record in review (final). */
@Command(name = "reject", description = "Reject a record in review (final).")
public final class RecordRejectCommand extends RecordStatusCommand {

    @Parameters(paramLabel = "ID", description = "Record number.")
    String id;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who takes this step.")
    String by;

    @Option(names = "--comment", required = true, paramLabel = "TEXT", description = "Why.")
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
        return RecordStatus.REJECTED;
    }
}
