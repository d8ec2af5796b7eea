package org.cohesa.desktop.target;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.cell.ComboBoxTableCell;
import javafx.scene.control.cell.TextFieldTableCell;
import javafx.scene.input.Clipboard;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.store.TestSeriesCsv;

/**
 * The dissolving tests of a fit as a table: one row per liquid (picked from the library or typed: a name, a blend
 * NAME:FRACTION;NAME:FRACTION, or a label with explicit δD, δP, δH), its score chosen (1 dissolves, 0.5 partly, 0 does
 * not, or any graded number or word {@link TestSeriesCsv} reads), and rows pasted from a spreadsheet (Ctrl+V: liquid,
 * score[, δD, δP, δH, note] separated by tabs, commas or semicolons; a header line is skipped). The table and the fit's CSV
 * text are one: an edit here rewrites the text (Commons CSV, names with commas quoted), a text loaded or typed fills the table.
 */
public final class TestTable {

    /** One test: every cell as typed. */
    public static final class Row {
        final StringProperty liquid = new SimpleStringProperty("");
        final StringProperty score = new SimpleStringProperty("");
        final StringProperty dD = new SimpleStringProperty("");
        final StringProperty dP = new SimpleStringProperty("");
        final StringProperty dH = new SimpleStringProperty("");
        final StringProperty note = new SimpleStringProperty("");

        Row(String liquid, String score, String dD, String dP, String dH, String note) {
            this(liquid, score, dD, dP, dH);
            this.note.set(note);
        }

        Row(String liquid, String score, String dD, String dP, String dH) {
            this.liquid.set(liquid);
            this.score.set(score);
            this.dD.set(dD);
            this.dP.set(dP);
            this.dH.set(dH);
        }

        public String liquid() {
            return liquid.get();
        }

        public String score() {
            return score.get();
        }
    }

    private final StringProperty csv;
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final TableView<Row> table = new TableView<>(rows);
    private final Label note = new Label();
    private final VBox root;
    private boolean writing;

    /**
     * @param csv     the fit's test results as CSV text (the fit reads it)
     * @param liquids the library's names, offered in the liquid cells
     */
    public TestTable(StringProperty csv, ObservableList<String> liquids) {
        this.csv = csv;
        table.setId("fit-tests");
        table.setEditable(true);
        table.getSelectionModel().setSelectionMode(javafx.scene.control.SelectionMode.MULTIPLE);
        TableColumn<Row, String> liquid = column("Liquid", r -> r.liquid, 165);
        liquid.setCellFactory(c -> {
            ComboBoxTableCell<Row, String> cell = new ComboBoxTableCell<>(liquids);
            cell.setComboBoxEditable(true);
            return cell;
        });
        TableColumn<Row, String> score = column("Score", r -> r.score, 64);
        score.setCellFactory(c -> {
            ComboBoxTableCell<Row, String> cell = new ComboBoxTableCell<>(FXCollections.observableArrayList("1", "0.5", "0"));
            cell.setComboBoxEditable(true);
            return cell;
        });
        TableColumn<Row, String> dD = column("δD", r -> r.dD, 46);
        TableColumn<Row, String> dP = column("δP", r -> r.dP, 46);
        TableColumn<Row, String> dH = column("δH", r -> r.dH, 46);
        for (TableColumn<Row, String> t : List.of(dD, dP, dH)) {
            t.setCellFactory(TextFieldTableCell.forTableColumn());
        }
        TableColumn<Row, String> remark = column("Note", r -> r.note, 120);
        remark.setCellFactory(TextFieldTableCell.forTableColumn());
        table.getColumns().addAll(List.of(liquid, score, dD, dP, dH, remark));
        table.setPlaceholder(new Label("No tests yet: Add a row, or paste rows from a spreadsheet (Ctrl+V)."));
        table.setPrefHeight(230);
        table.setOnKeyPressed(e -> {
            if (e.isShortcutDown() && e.getCode() == KeyCode.V) {
                paste(Clipboard.getSystemClipboard().getString());
                e.consume();
            } else if (e.getCode() == KeyCode.DELETE) {
                removeSelected();
            }
        });
        Button add = new Button("Add a row");
        add.setId("fit-tests-add");
        add.setOnAction(e -> {
            rows.add(new Row("", "", "", "", ""));
            write();
            table.getSelectionModel().clearAndSelect(rows.size() - 1);
            table.edit(rows.size() - 1, liquid);
        });
        Button paste = new Button("Paste rows");
        paste.setId("fit-tests-paste");
        paste.setOnAction(e -> paste(Clipboard.getSystemClipboard().getString()));
        Button remove = new Button("Remove");
        remove.setId("fit-tests-remove");
        remove.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        remove.setOnAction(e -> removeSelected());
        note.setId("fit-tests-note");
        note.setWrapText(true);
        note.getStyleClass().add("form-problems");
        note.managedProperty().bind(note.visibleProperty());
        note.setVisible(false);
        HBox bar = new HBox(6, add, paste, remove);
        bar.setAlignment(Pos.CENTER_LEFT);
        root = new VBox(6, table, bar, note);
        root.setPadding(new Insets(0));
        VBox.setVgrow(table, Priority.ALWAYS);
        csv.addListener((o, a, text) -> {
            if (!writing) {
                read(text);
            }
        });
        read(csv.get());
    }

    public Node node() {
        return root;
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    private TableColumn<Row, String> column(String title, java.util.function.Function<Row, StringProperty> p, double width) {
        TableColumn<Row, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> p.apply(cd.getValue()));
        c.setOnEditCommit(e -> {
            p.apply(e.getRowValue()).set(e.getNewValue() == null ? "" : e.getNewValue().strip());
            write();
        });
        c.setPrefWidth(width);
        c.setSortable(false);
        return c;
    }

    private void removeSelected() {
        List<Row> gone = new ArrayList<>(table.getSelectionModel().getSelectedItems());
        rows.removeAll(gone);
        write();
    }

    /** Appends rows pasted from a spreadsheet or a text file (tabs, commas or semicolons); a header line is skipped. */
    public void paste(String text) {
        if (text == null || text.isBlank()) {
            return;
        }
        List<Row> read = parse(text, false);
        if (read == null) {
            return;
        }
        rows.removeIf(r -> r.liquid().isBlank() && r.score().isBlank());
        rows.addAll(read);
        write();
    }

    /** The table as the fit's CSV: a header, then one line per row that has a liquid. */
    private void write() {
        boolean explicit = rows.stream().anyMatch(r -> !r.dD.get().isBlank() || !r.dP.get().isBlank() || !r.dH.get().isBlank());
        boolean notes = rows.stream().anyMatch(r -> !r.note.get().isBlank());
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder().setRecordSeparator("\n").build())) {
            List<String> head = new ArrayList<>(explicit ? List.of("liquid", "score", "dD", "dP", "dH") : List.of("liquid", "score"));
            if (notes) {
                head.add("note");
            }
            p.printRecord(head);
            for (Row r : rows) {
                if (r.liquid().isBlank() && r.score().isBlank()) {
                    continue;
                }
                List<String> line = new ArrayList<>(explicit ? List.of(r.liquid(), r.score(), r.dD.get(), r.dP.get(), r.dH.get())
                        : List.of(r.liquid(), r.score()));
                if (notes) {
                    line.add(r.note.get());
                }
                p.printRecord(line);
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        writing = true;
        try {
            csv.set(w.toString());
        } finally {
            writing = false;
        }
    }

    /** Fills the table from the CSV text; text the table cannot show (broken quoting) is said and left as it is. */
    private void read(String text) {
        List<Row> read = parse(text == null ? "" : text, true);
        if (read != null) {
            rows.setAll(read);
        }
    }

    /**
     * Rows of the text, or null when it cannot be split into cells. The separator is the one the first line uses most,
     * as {@link TestSeriesCsv} chooses it; with a header the columns go by its names, without one they are liquid,
     * score, δD, δP, δH in that order.
     */
    private List<Row> parse(String text, boolean fromText) {
        String first = text.lines().filter(l -> !l.isBlank() && !l.strip().startsWith("#")).findFirst().orElse("");
        char sep = separator(first);
        try (CSVParser p = CSVParser.parse(new StringReader(text.startsWith("\uFEFF") ? text.substring(1) : text),
                CSVFormat.RFC4180.builder().setDelimiter(sep).setIgnoreEmptyLines(true).setTrim(true)
                        .setCommentMarker('#').build())) {
            List<CSVRecord> records = p.getRecords();
            int[] at = {0, 1, -1, -1, -1, -1};
            int start = 0;
            if (!records.isEmpty() && isHeader(records.get(0))) {
                at = new int[] {-1, -1, -1, -1, -1, -1};
                CSVRecord h = records.get(0);
                String[] roles = {"liquid", "score", "dD", "dP", "dH", "note"};
                for (int i = 0; i < h.size(); i++) {
                    String name = h.get(i).strip().toLowerCase(Locale.ROOT);
                    for (int k = 0; k < roles.length; k++) {
                        if (at[k] < 0 && TestSeriesCsv.COLUMNS.get(roles[k]).contains(name)) {
                            at[k] = i;
                        }
                    }
                }
                start = 1;
                // columns the table has no place for (CAS, temperature, note) would be lost by an edit: text only then
                List<String> more = new ArrayList<>();
                for (int i = 0; i < h.size(); i++) {
                    int col = i;
                    if (java.util.Arrays.stream(at).noneMatch(x -> x == col) && !h.get(i).isBlank()) {
                        more.add(h.get(i).strip());
                    }
                }
                if (fromText && !more.isEmpty()) {
                    table.setEditable(false);
                    List<Row> out = new ArrayList<>();
                    for (int i = 1; i < records.size(); i++) {
                        CSVRecord r = records.get(i);
                        out.add(new Row(cell(r, at[0]), cell(r, at[1]), cell(r, at[2]), cell(r, at[3]), cell(r, at[4]), cell(r, at[5])));
                    }
                    note.setText("This series has columns the table does not show (" + String.join(", ", more)
                            + "): the fit reads them; edit it in the text below.");
                    note.setVisible(true);
                    return out;
                }
            } else if (!records.isEmpty() && records.get(0).size() > 2) {
                at = new int[] {0, 1, 2, 3, 4, 5};
            }
            List<Row> out = new ArrayList<>();
            for (int i = start; i < records.size(); i++) {
                CSVRecord r = records.get(i);
                out.add(new Row(cell(r, at[0]), cell(r, at[1]), cell(r, at[2]), cell(r, at[3]), cell(r, at[4]), cell(r, at[5])));
            }
            note.setVisible(false);
            table.setEditable(true);
            return out;
        } catch (IOException | RuntimeException e) {
            note.setText((fromText ? "The text cannot be shown as a table (" : "The pasted rows cannot be read (") + e.getMessage()
                    + "): fix it in the text below.");
            note.setVisible(true);
            return null;
        }
    }

    private static boolean isHeader(CSVRecord r) {
        String c = r.size() == 0 ? "" : r.get(0).strip().toLowerCase(Locale.ROOT);
        return TestSeriesCsv.COLUMNS.values().stream().anyMatch(names -> names.contains(c)) || c.equals("cas");
    }

    private static String cell(CSVRecord r, int i) {
        return i < 0 || i >= r.size() ? "" : r.get(i).strip();
    }

    private static char separator(String line) {
        long commas = line.chars().filter(ch -> ch == ',').count();
        long semis = line.chars().filter(ch -> ch == ';').count();
        long tabs = line.chars().filter(ch -> ch == '\t').count();
        return tabs >= commas && tabs >= semis && tabs > 0 ? '\t' : semis > commas ? ';' : ',';
    }
}
