package org.cohesa.desktop.common;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * What every table of the app can do: copy the selected rows (Ctrl+C or the context menu, tab-separated so
 * they paste into a spreadsheet as cells), and export all its rows to CSV (Commons CSV, RFC 4180, names with
 * commas quoted), in the order and columns the user sees.
 */
public final class TableTools {

    private static final KeyCombination COPY = new KeyCodeCombination(KeyCode.C, KeyCombination.SHORTCUT_DOWN);

    private TableTools() {
    }

    /** Adds copy (Ctrl+C, context menu) and "Export to CSV…" to a table; {@code export} runs the export dialog. */
    public static void equip(TableView<?> table, Runnable export) {
        table.getSelectionModel().setSelectionMode(SelectionMode.MULTIPLE);
        MenuItem copy = new MenuItem("Copy");
        copy.setAccelerator(COPY);
        copy.setOnAction(e -> copySelection(table));
        MenuItem copyAll = new MenuItem("Copy all rows");
        copyAll.setOnAction(e -> copyToClipboard(asText(table, true, '\t')));
        MenuItem csv = new MenuItem("Export to CSV…");
        csv.setOnAction(e -> export.run());
        table.setContextMenu(new ContextMenu(copy, copyAll, csv));
        table.setOnKeyPressed(e -> {
            if (COPY.match(e)) {
                copySelection(table);
                e.consume();
            }
        });
    }

    public static void copySelection(TableView<?> table) {
        copyToClipboard(asText(table, false, '\t'));
    }

    public static void copyToClipboard(String text) {
        ClipboardContent c = new ClipboardContent();
        c.putString(text);
        Clipboard.getSystemClipboard().setContent(c);
    }

    /** The header and the selected (or all) rows as text, cells separated by {@code sep}. */
    public static String asText(TableView<?> table, boolean allRows, char sep) {
        List<List<String>> rows = cells(table, allRows);
        StringBuilder sb = new StringBuilder();
        for (List<String> row : rows) {
            sb.append(String.join(String.valueOf(sep), row)).append('\n');
        }
        return sb.toString();
    }

    /** Writes the header and every row of the table, as shown (sorted, filtered), to {@code file} as CSV. */
    /** Asks where to save, writes the table as CSV and reports the outcome in the status bar. */
    public static void exportWithDialog(javafx.scene.Node owner, TableView<?> table, String title, String suggestedName, Jobs jobs) {
        Path file = Dialogs.saveFile(owner, title, suggestedName, "CSV files", "*.csv");
        if (file == null) {
            return;
        }
        try {
            writeCsv(table, file);
            jobs.say("Exported " + table.getItems().size() + " rows to " + file);
        } catch (IOException | RuntimeException ex) {
            jobs.complain(ErrorText.of(ex));
        }
    }

    public static void writeCsv(TableView<?> table, Path file) throws IOException {
        List<List<String>> rows = cells(table, true);
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            writeCsv(rows, w);
        }
    }

    public static void writeCsv(List<List<String>> rows, Writer w) throws IOException {
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180)) {
            for (List<String> row : rows) {
                p.printRecord(row);
            }
        }
    }

    /** Header row then data rows, as the text the cells show. Call on the FX thread. */
    public static List<List<String>> cells(TableView<?> table, boolean allRows) {
        List<TableColumn<?, ?>> cols = new ArrayList<>();
        for (TableColumn<?, ?> c : table.getVisibleLeafColumns()) {
            cols.add(c);
        }
        List<List<String>> out = new ArrayList<>();
        List<String> header = new ArrayList<>();
        for (TableColumn<?, ?> c : cols) {
            header.add(c.getText());
        }
        out.add(header);
        List<Integer> indices = allRows ? range(table.getItems().size()) : new ArrayList<>(table.getSelectionModel().getSelectedIndices());
        indices.sort(Integer::compare);
        for (int i : indices) {
            List<String> row = new ArrayList<>();
            for (TableColumn<?, ?> c : cols) {
                Object v = c.getCellData(i);
                row.add(text(v));
            }
            out.add(row);
        }
        return out;
    }

    private static String text(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return Numbers.plain(d).isEmpty() ? "" : trimNumber(d);
        }
        return v.toString();
    }

    private static String trimNumber(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e9) {
            return String.valueOf((long) d);
        }
        return new java.math.BigDecimal(d).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    private static List<Integer> range(int n) {
        List<Integer> l = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            l.add(i);
        }
        return l;
    }
}
