package org.cohesa.cli.records;

import org.cohesa.cli.Output;

import org.cohesa.core.records.SubstitutionRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code cohesa record show ID}: one record with its history and evidence. */
@Command(name = "show", description = "Show one record: content, evidence, history.")
public final class RecordShowCommand extends RecordSubcommand {

    @Parameters(paramLabel = "ID", description = "Record number.")
    String id;

    @Override
    protected void run() {
        SubstitutionRecord r = repo().get(RecordSupport.parseId(id));
        if (json()) {
            Output.json(out(), RecordJson.Record.of(r, true));
            return;
        }
        RecordView.printRecord(out(), r);
    }
}
