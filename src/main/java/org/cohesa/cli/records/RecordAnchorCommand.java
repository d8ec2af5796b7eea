package org.cohesa.cli.records;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import org.cohesa.cli.Output;
import org.cohesa.cli.OutputFile;
import org.cohesa.core.records.Anchor;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RegisterKey;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record anchor FILE}: writes the register's current state (head hash, count, time) for the quality file. */
@Command(name = "anchor", description = "Write a small anchor file (head hash, number of events and records, time, HMAC) to keep outside"
        + " the database; 'record verify --anchor FILE' later shows whether the register still contains that state.")
public final class RecordAnchorCommand extends RecordSubcommand {

    @Parameters(paramLabel = "FILE", description = "The anchor file to write (JSON).")
    Path file;

    @Option(names = "--overwrite", description = "Replace FILE if it exists (never a folder or device).")
    boolean overwrite;

    @Override
    protected void run() throws Exception {
        OutputFile.check("FILE", file, overwrite);
        RegisterKey key = repo().sealedByServer() ? null : repo().key().orElse(null);
        ChainReport chain = repo().verify(key, null);
        String sealId = repo().sealId(key).orElse(null);
        if (!chain.intact()) {
            throw new org.cohesa.core.InvalidInputException("register", repo().register().location(),
                    "is broken (" + chain.firstProblem().orElseThrow().describe() + "); an anchor would vouch for a damaged register."
                            + " Run cohesa record verify");
        }
        String at = RecordEvent.formatAt(Instant.now());
        Anchor a = new Anchor(chain.headHash(), chain.events(), chain.records(), at, sealId, null);
        AnchorFile.Content content = new AnchorFile.Content(AnchorFile.FORMAT, repo().register().kind() + " " + repo().register().location(),
                a.headHash(), chain.events(), chain.records(), at, a.keyId(), repo().anchorMac(a.content(), key),
                "Keep this file outside the database (quality file, e-mail to yourself, print). cohesa record verify --anchor FILE"
                        + " shows whether the register still holds this state.");
        byte[] bytes = (Output.mapper().writeValueAsString(content) + "\n").getBytes(StandardCharsets.UTF_8);
        OutputFile.write("FILE", file, overwrite, out -> out.write(bytes));
        if (json()) {
            Output.json(out(), content);
            return;
        }
        out().println("Wrote anchor " + file + ": " + chain.events() + " events in " + chain.records() + " records, head hash "
                + chain.headHash() + (sealId == null ? " (no register key: the anchor carries no HMAC)" : "") + ".");
    }
}
