package org.cohesa.cli.records;

import org.cohesa.cli.AppVersion;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.report.RecordPdf;
import org.cohesa.report.RegisterCsv;
import org.cohesa.store.RecordRepository;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record export [ID] (--pdf FILE | --csv FILE)}: a filed report or the register. */
@Command(name = "export", description = "Write one record as a PDF report (--pdf, needs ID) or the register as CSV (--csv; only record ID when given).")
public final class RecordExportCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "ID", arity = "0..1", description = "Record number (required for --pdf).")
    String id;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Format format;

    /** Exactly one output. */
    static final class Format {
        @Option(names = "--pdf", required = true, paramLabel = "FILE", description = "PDF report of one record.")
        Path pdf;
        @Option(names = "--csv", required = true, paramLabel = "FILE", description = "The register (one row per record) as CSV.")
        Path csv;
    }

    @Override
    protected void execute() throws IOException {
        RecordRepository repo = new RecordRepository(ctx().database());
        Path file = format.pdf != null ? format.pdf : format.csv;
        String field = format.pdf != null ? "--pdf" : "--csv";
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null && !Files.isDirectory(parent)) {
            throw new InvalidInputException(field, file.toString(), "its folder does not exist");
        }
        List<SubstitutionRecord> records;
        if (format.pdf != null) {
            if (id == null) {
                throw new InvalidInputException("ID", "", "--pdf exports one record; give its number, e.g. record export 3 --pdf r3.pdf");
            }
            records = List.of(repo.get(RecordSupport.parseId(id)));
        } else {
            records = id == null ? repo.all() : List.of(repo.get(RecordSupport.parseId(id)));
        }
        ChainReport chain = repo.verify();
        // write beside the target and move into place, so a failed export never leaves half a file
        Path tmp = Files.createTempFile(parent == null ? Path.of(".") : parent, ".cohesa-export", ".tmp");
        try {
            if (format.pdf != null) {
                List<org.cohesa.core.records.RecordEvent> events = repo.events(records.get(0).id());
                RecordPdf.write(records.get(0), events.get(events.size() - 1).hash(), chain, AppVersion.get(), tmp);
            } else {
                try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                    RegisterCsv.write(records, w);
                }
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
        if (json()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("file", file.toString());
            m.put("format", format.pdf != null ? "pdf" : "csv");
            m.put("records", records.stream().map(SubstitutionRecord::id).toList());
            m.put("chain_intact", chain.intact());
            Output.json(out(), m);
            return;
        }
        out().println("Wrote " + file + " (" + records.size() + (records.size() == 1 ? " record" : " records") + ").");
        if (!chain.intact()) {
            out().println("warning: the register's hash chain is broken; run cohesa record verify.");
        }
    }
}
