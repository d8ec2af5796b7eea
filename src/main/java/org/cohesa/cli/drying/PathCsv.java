package org.cohesa.cli.drying;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.PathPoint;

/**
 * A drying path as CSV (RFC 4180, UTF-8): one row per point, the unit in each column's header, so a spreadsheet
 * or a script reads it without the table's explanations. Columns: evaporated_pct, relative_time (n-butyl acetate
 * = 1), one volume-fraction column per solvent ({@code phi <name>}), dD/dP/dH in MPa^0.5 and RED (empty without a target).
 */
final class PathCsv {

    private PathCsv() {
    }

    static void write(DryingPath path, OutputStream out) throws IOException {
        List<String> names = new ArrayList<>(path.points().get(0).composition().keySet());
        List<String> header = new ArrayList<>(List.of("evaporated_pct", "relative_time"));
        names.forEach(n -> header.add("phi " + n));
        header.addAll(List.of("dD_MPa0.5", "dP_MPa0.5", "dH_MPa0.5", "RED"));
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder().setHeader(header.toArray(String[]::new)).get())) {
            for (PathPoint pt : path.points()) {
                List<String> row = new ArrayList<>();
                row.add(num(100 * pt.evaporated(), 4));
                row.add(num(pt.time(), 6));
                for (String n : names) {
                    row.add(num(pt.composition().get(n), 6));
                }
                row.add(pt.hansen() == null ? "" : num(pt.hansen().dD(), 4));
                row.add(pt.hansen() == null ? "" : num(pt.hansen().dP(), 4));
                row.add(pt.hansen() == null ? "" : num(pt.hansen().dH(), 4));
                row.add(pt.red() == null ? "" : num(pt.red(), 5));
                p.printRecord(row);
            }
        }
    }

    private static String num(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
