package org.cohesa.cli.records;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;

import com.fasterxml.jackson.databind.node.ArrayNode;
import java.util.List;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.store.RecordRepository;
import picocli.CommandLine.Command;

/** {@code cohesa record list}: the register. */
@Command(name = "list", description = "List every substitution record with its status.")
public final class RecordListCommand extends CohesaSubcommand {

    @Override
    protected void execute() {
        List<SubstitutionRecord> all = new RecordRepository(ctx().database()).all();
        if (json()) {
            ArrayNode a = Output.mapper().createArrayNode();
            all.forEach(r -> a.add(RecordView.json(r, false)));
            Output.json(out(), a);
            return;
        }
        RecordView.printList(out(), all);
    }
}
