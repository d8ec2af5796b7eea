package org.cohesa.cli.records;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.SequenceWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;
import org.cohesa.core.records.StatusChange;
import picocli.CommandLine.Command;

/** {@code cohesa record list}: the register, streamed one record at a time. */
@Command(name = "list", description = "List every substitution record with its status.")
public final class RecordListCommand extends RecordSubcommand {

    @Override
    protected void run() throws IOException {
        if (json()) {
            int skipped;
            try (SequenceWriter w = Output.mapper().writer().without(JsonGenerator.Feature.AUTO_CLOSE_TARGET).writeValuesAsArray(out())) {
                skipped = repo().forEachRecord(r -> {
                    try {
                        w.write(RecordJson.Record.of(r, false));
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                });
            }
            out().println();
            warnSkipped(skipped);
            return;
        }
        TextTable t = new TextTable("id", "status", "process", "replaced", "replacement", "author", "created", "last step");
        int skipped = repo().forEachRecord(r -> {
            StatusChange last = r.history().get(r.history().size() - 1);
            t.row(r.id(), r.status().label() + (r.damage() == null ? "" : " (damaged)"), RecordView.shorten(r.content().process(), 30),
                    RecordView.shorten(r.content().replaced(), 28), RecordView.shorten(r.content().replacement(), 28), r.author(),
                    r.created().substring(0, 16).replace('T', ' '), last.kind() + " by " + last.by());
        });
        if (t.size() == 0) {
            out().println("No substitution records yet. File one with: cohesa record add --help");
        } else {
            t.print(out());
        }
        warnSkipped(skipped);
    }

    private void warnSkipped(int skipped) {
        if (skipped > 0) {
            spec.commandLine().getErr().println("warning: " + skipped + (skipped == 1 ? " record" : " records")
                    + " could not be read (filing event missing or damaged); run cohesa record verify");
            spec.commandLine().getErr().flush();
        }
    }
}
