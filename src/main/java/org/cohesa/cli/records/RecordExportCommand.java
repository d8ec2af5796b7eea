package org.cohesa.cli.records;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cohesa.cli.AppVersion;
import org.cohesa.cli.Output;
import org.cohesa.cli.OutputFile;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.report.RecordPdf;
import org.cohesa.report.RegisterCsv;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record export [ID] (--pdf FILE | --csv FILE) [--overwrite]}: a filed report or the register. */
@Command(name = "export", description = "Write one record as a PDF report (--pdf, needs ID) or the register as CSV (--csv; only record ID when given)."
        + " An existing file is replaced only with --overwrite.")
public final class RecordExportCommand extends RecordSubcommand {

    @Parameters(paramLabel = "ID", arity = "0..1", description = "Record number (required for --pdf).")
    String id;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Format format;

    @Option(names = "--overwrite", description = "Replace FILE if it exists (never a folder, device or other non-regular file).")
    boolean overwrite;

    /** Exactly one output. */
    static final class Format {
        @Option(names = "--pdf", required = true, paramLabel = "FILE", description = "PDF report of one record.")
        Path pdf;
        @Option(names = "--csv", required = true, paramLabel = "FILE", description = "The register (one row per record) as CSV.")
        Path csv;
    }

    @Override
    protected void run() throws IOException {
        Path file = format.pdf != null ? format.pdf : format.csv;
        String field = format.pdf != null ? "--pdf" : "--csv";
        OutputFile.check(field, file, overwrite);
        if (format.pdf != null && id == null) {
            throw new InvalidInputException("ID", "", "--pdf exports one record; give its number, e.g. record export 3 --pdf r3.pdf");
        }
        Long only = id == null ? null : RecordSupport.parseId(id);
        SubstitutionRecord single = only == null ? null : repo().get(only);
        ChainReport chain = repo().verify();
        List<Long> ids = new ArrayList<>();
        int[] skipped = {0};
        if (format.pdf != null) {
            Path tmp = Files.createTempFile(file.toAbsolutePath().getParent(), ".cohesa-pdf", ".tmp");
            try {
                RecordPdf.write(single, single.headHash(), chain, AppVersion.get(), tmp);
                byte[] pdf = Files.readAllBytes(tmp);
                OutputFile.write(field, file, overwrite, out -> out.write(pdf));
            } finally {
                Files.deleteIfExists(tmp);
            }
            ids.add(single.id());
        } else {
            OutputFile.write(field, file, overwrite, out -> {
                Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
                try (RegisterCsv csv = RegisterCsv.open(w)) {
                    if (single != null) {
                        csv.row(single, single.headHash());
                        ids.add(single.id());
                    } else {
                        // one record at a time: a register of thousands of records is exported in little memory
                        skipped[0] = repo().forEachRecord(r -> {
                            try {
                                csv.row(r, r.headHash());
                                ids.add(r.id());
                            } catch (IOException e) {
                                throw new UncheckedIOException(e);
                            }
                        });
                    }
                } catch (UncheckedIOException e) {
                    throw e.getCause();
                }
            });
        }
        if (json()) {
            Output.json(out(), new RecordJson.Export(file.toString(), format.pdf != null ? "pdf" : "csv", ids.size(), ids, chain.intact(),
                    chain.headHash(), skipped[0]));
            return;
        }
        out().println("Wrote " + file + " (" + ids.size() + (ids.size() == 1 ? " record" : " records") + "; register head hash "
                + chain.headHash() + ").");
        if (!chain.intact()) {
            out().println("warning: the register is broken (" + chain.firstProblem().orElseThrow().describe() + "); run cohesa record verify.");
        }
        if (skipped[0] > 0) {
            out().println("warning: " + skipped[0] + " records could not be read and are missing from the file; run cohesa record verify.");
        }
    }
}
