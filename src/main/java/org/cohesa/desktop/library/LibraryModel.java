package org.cohesa.desktop.library;

import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.collections.transformation.FilteredList;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Session;
import org.cohesa.core.target.Material;
import org.cohesa.store.Database;
import org.cohesa.store.MaterialRepository;
import org.cohesa.store.SolventCsv;
import org.cohesa.store.SolventRepository;

/**
 * View-model of the library screen: the filter, the filtered solvents, and the user's changes (add, edit,
 * remove, CSV import), each run off the FX thread through the session's jobs and followed by a reload.
 * Problems of an import are kept as a list of lines for the screen to show.
 */
public final class LibraryModel {

    private final Session session;
    private final StringProperty filter = new SimpleStringProperty("");
    private final FilteredList<Solvent> filtered;
    private final FilteredList<Material> filteredMaterials;
    private final ObservableList<String> importProblems = FXCollections.observableArrayList();

    public LibraryModel(Session session) {
        this.session = session;
        filtered = new FilteredList<>(session.solvents(), s -> true);
        filteredMaterials = new FilteredList<>(session.materials(), m -> true);
        filter.addListener((o, a, text) -> {
            filtered.setPredicate(s -> matches(s, text));
            filteredMaterials.setPredicate(m -> matches(m, text));
        });
    }

    public Session session() {
        return session;
    }

    public StringProperty filterProperty() {
        return filter;
    }

    public FilteredList<Solvent> filtered() {
        return filtered;
    }

    public FilteredList<Material> filteredMaterials() {
        return filteredMaterials;
    }

    /** Lines describing the last refused import (empty when it went through). */
    public ObservableList<String> importProblems() {
        return importProblems;
    }

    /** Reads the whole library from the database. */
    public void reload(Runnable then) {
        session.jobs().run("Loading the library", p -> {
            try (Database db = session.openDatabase()) {
                return new Loaded(new SolventRepository(db).all(), new MaterialRepository(db).all());
            }
        }, loaded -> {
            List<Solvent> list = loaded.solvents();
            session.solvents().setAll(list);
            session.materials().setAll(loaded.materials());
            session.jobs().say(list.size() + " solvents (" + list.stream().filter(Solvent::userEntry).count()
                    + " of your own) and " + loaded.materials().size() + " materials · " + session.databaseFile());
            if (then != null) {
                then.run();
            }
        });
    }

    public void add(Solvent s, Runnable then) {
        write("Adding " + s.name(), repo -> repo.add(s), then);
    }

    public void update(String oldName, Solvent s, Runnable then) {
        write("Saving " + s.name(), repo -> repo.update(oldName, s), then);
    }

    public void remove(String name, Runnable then) {
        write("Removing " + name, repo -> repo.remove(name), then);
    }

    /** Imports the user's solvents from a CSV file: all rows or none; every bad cell is listed. */
    public void importCsv(Path file, Runnable then) {
        importProblems.clear();
        session.jobs().run("Importing " + file.getFileName(), p -> {
            List<Solvent> rows;
            try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
                rows = SolventCsv.read(file.getFileName().toString(), r, true);
            }
            try (Database db = session.openDatabase()) {
                new SolventRepository(db).importAll(rows);
            }
            return rows.size();
        }, n -> reload(() -> {
            session.jobs().say("Imported " + n + " solvents from " + file.getFileName() + ".");
            if (then != null) {
                then.run();
            }
        }), err -> showImportProblem(file));
    }

    private void showImportProblem(Path file) {
        // the job's failure text is one line; the bad cells are re-read so the screen can list every one
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            SolventCsv.read(file.getFileName().toString(), r, true);
            importProblems.setAll(session.jobs().messageProperty().get());
        } catch (BadRowsException e) {
            importProblems.setAll(e.errors().stream().map(RowError::describe).toList());
        } catch (Exception e) {
            importProblems.setAll(ErrorText.of(e));
        }
    }

    private record Loaded(List<Solvent> solvents, List<Material> materials) {
    }

    private interface RepoWork {
        void run(SolventRepository repo);
    }

    private void write(String title, RepoWork work, Runnable then) {
        session.jobs().run(title, p -> {
            try (Database db = session.openDatabase()) {
                work.run(new SolventRepository(db));
            }
            return Boolean.TRUE;
        }, ok -> reload(then));
    }

    static boolean matches(Material m, String text) {
        if (text == null || text.isBlank()) {
            return true;
        }
        String k = text.strip().toLowerCase(Locale.ROOT);
        return m.name().toLowerCase(Locale.ROOT).contains(k) || m.kind().key().contains(k)
                || m.synonyms().stream().anyMatch(x -> x.toLowerCase(Locale.ROOT).contains(k));
    }

    static boolean matches(Solvent s, String text) {
        if (text == null || text.isBlank()) {
            return true;
        }
        String k = text.strip().toLowerCase(Locale.ROOT);
        return s.name().toLowerCase(Locale.ROOT).contains(k) || (s.cas() != null && s.cas().contains(k))
                || (s.family() != null && s.family().toLowerCase(Locale.ROOT).replace('_', ' ').contains(k))
                || s.synonyms().stream().anyMatch(x -> x.toLowerCase(Locale.ROOT).contains(k));
    }
}
