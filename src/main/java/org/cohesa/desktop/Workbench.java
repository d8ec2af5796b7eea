package org.cohesa.desktop;

import java.util.EnumMap;
import java.util.Map;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.Settings;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.blend.BlendView;
import org.cohesa.desktop.drying.DryingModel;
import org.cohesa.desktop.drying.DryingView;
import org.cohesa.desktop.library.LibraryModel;
import org.cohesa.desktop.records.RecordsModel;
import org.cohesa.desktop.records.RecordsView;
import org.cohesa.desktop.library.LibraryView;
import org.cohesa.desktop.space.Colouring;
import org.cohesa.desktop.space.SpaceModel;
import org.cohesa.desktop.space.SpaceView;
import org.cohesa.desktop.target.TargetModel;
import org.cohesa.desktop.target.TargetView;
import org.cohesa.desktop.cases.CaseModel;
import org.cohesa.desktop.cases.CaseStrip;
import org.cohesa.desktop.cases.CasesView;
import org.cohesa.desktop.cases.ChecksView;
import org.cohesa.desktop.cases.RecordStepView;
import java.util.List;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The main window: a menu bar, one tab per screen, and a status bar with the current job's progress and a
 * cancel button. Builds the view-models over one {@link Session} and wires the screens to it.
 */
public final class Workbench {

    static final String SAFETY_NOTICE = "Every number Cohesa shows is a screening estimate. Solvents burn, poison and can harm "
            + "fertility. The supplier's safety data sheet, your local codes and your site's licensed safety professionals "
            + "decide; test every blend in the lab before use.";

    private final Session session;
    private final BorderPane root = new BorderPane();
    private final javafx.scene.layout.StackPane deck = new javafx.scene.layout.StackPane();
    private final Map<Screen, Node> paneByScreen = new EnumMap<>(Screen.class);
    private Screen showing = Screen.CASES;
    private final CaseModel caseModel;
    private final CaseStrip strip;
    private final BlendView blendView;
    private final org.cohesa.desktop.cases.LimitsStepView limitsStep;
    private final org.cohesa.desktop.cases.CandidatesStepView candidatesStep;
    private final org.cohesa.desktop.cases.InsideOutPanel insideOut;
    private final LibraryModel libraryModel;
    private final LibraryView libraryView;
    private final TargetView targetView;
    private final SpaceModel spaceModel;
    private final SpaceView spaceView;
    private final DryingModel dryingModel;
    private final RecordsModel recordsModel;
    private final BlendModel blendModel;
    private final Label startText = new Label();
    private final VBox startOverlay;

    public Workbench(Session session) {
        this.session = session;
        startOverlay = startOverlay();
        root.setId("workbench");
        libraryModel = new LibraryModel(session);
        libraryView = new LibraryView(libraryModel);
        targetView = new TargetView(new TargetModel(session));
        spaceModel = new SpaceModel(session);
        spaceView = new SpaceView(spaceModel);
        dryingModel = new DryingModel(session);
        blendModel = new BlendModel(session);
        recordsModel = new RecordsModel(session);
        caseModel = new CaseModel(session, blendModel, recordsModel, java.time.Clock.systemUTC());
        blendView = new BlendView(blendModel, this::openDrying);
        blendView.onChoose(rows -> {
            try {
                caseModel.choose(rows);
            } catch (RuntimeException ex) {
                session.jobs().complain(org.cohesa.desktop.common.ErrorText.of(ex));
            }
        });
        insideOut = new org.cohesa.desktop.cases.InsideOutPanel(blendModel);
        blendView.addPanel("Inside or out", insideOut.node(), "blend-inside-out-tab");
        addScreen(Screen.CASES, new CasesView(caseModel, () -> show(Screen.TARGET)).node());
        addScreen(Screen.TARGET, targetView.node());
        limitsStep = new org.cohesa.desktop.cases.LimitsStepView(caseModel, blendView.limitsNode(), () -> show(Screen.BLENDS));
        addScreen(Screen.LIMITS, limitsStep.node());
        candidatesStep = new org.cohesa.desktop.cases.CandidatesStepView(caseModel, blendView.node(), () -> show(Screen.LIMITS));
        addScreen(Screen.BLENDS, candidatesStep.node());
        // a search started on the Limits step goes on to its candidates
        blendView.onSearched(() -> {
            if (showing == Screen.LIMITS) {
                show(Screen.BLENDS);
            }
        });
        addScreen(Screen.CHECKS, new ChecksView(caseModel, this::openDrying).node());
        addScreen(Screen.RECORD, new RecordStepView(caseModel, () -> show(Screen.RECORDS)).node());
        addScreen(Screen.LIBRARY, libraryView.node());
        addScreen(Screen.DRYING, new DryingView(dryingModel).node());
        addScreen(Screen.SPACE, spaceView.node());
        addScreen(Screen.RECORDS, new RecordsView(recordsModel).node());
        deck.setId("screens");
        strip = new CaseStrip(caseModel, this::showStep, () -> {
            caseModel.refreshList(null);
            show(Screen.CASES);
        }, List.of(new CaseStrip.Reference("Library", "ref-library", () -> show(Screen.LIBRARY)),
                new CaseStrip.Reference("Space", "ref-space", () -> show(Screen.SPACE)),
                new CaseStrip.Reference("Drying", "ref-drying", () -> show(Screen.DRYING)),
                new CaseStrip.Reference("Register", "ref-register", () -> show(Screen.RECORDS))));
        root.setTop(new VBox(menus(), strip.node()));
        root.setCenter(new javafx.scene.layout.StackPane(deck, startOverlay));
        show(Screen.CASES);
        root.setBottom(statusBar());
    }

    public Parent root() {
        return root;
    }

    public Session session() {
        return session;
    }

    public SpaceView spaceView() {
        return spaceView;
    }

    public SpaceModel spaceModel() {
        return spaceModel;
    }

    public LibraryView libraryView() {
        return libraryView;
    }

    public BlendModel blendModel() {
        return blendModel;
    }

    /** Shows a blend's drying path: the drying screen, computed at once. */
    public void openDrying(org.cohesa.core.solvent.Blend b) {
        dryingModel.blendTextProperty().set(b.describe());
        show(Screen.DRYING);
        try {
            dryingModel.run(null);
        } catch (RuntimeException ex) {
            session.jobs().complain(org.cohesa.desktop.common.ErrorText.of(ex));
        }
    }

    public RecordsModel recordsModel() {
        return recordsModel;
    }

    public DryingModel dryingModel() {
        return dryingModel;
    }

    public LibraryModel libraryModel() {
        return libraryModel;
    }

    public CaseModel caseModel() {
        return caseModel;
    }

    public CaseStrip caseStrip() {
        return strip;
    }

    public org.cohesa.desktop.cases.InsideOutPanel insideOut() {
        return insideOut;
    }

    public BlendView blendView() {
        return blendView;
    }

    public org.cohesa.desktop.cases.LimitsStepView limitsStep() {
        return limitsStep;
    }

    public org.cohesa.desktop.cases.CandidatesStepView candidatesStep() {
        return candidatesStep;
    }

    /** Shows the pane of a case's step. */
    public void showStep(org.cohesa.core.cases.CaseStep step) {
        show(switch (step) {
            case MATERIAL -> Screen.TARGET;
            case LIMITS -> Screen.LIMITS;
            case CANDIDATES -> Screen.BLENDS;
            case CHECKS -> Screen.CHECKS;
            case RECORD -> Screen.RECORD;
        });
    }

    public TargetView targetView() {
        return targetView;
    }

    /**
     * Loads the library off the FX thread; {@code then} runs on the FX thread once it is shown. Until then the
     * window says what is happening (on a first start the database is built from the bundled tables, which takes a while).
     */
    public void load(Runnable then) {
        boolean first = !java.nio.file.Files.exists(session.databaseFile());
        startText.setText(first
                ? "First start: building the solvent database from the bundled tables (every value with its source). This takes a moment, once."
                : "Opening the solvent database…");
        startOverlay.setVisible(true);
        Runnable done = () -> {
            startOverlay.setVisible(false);
            if (then != null) {
                then.run();
            }
        };
        libraryModel.reload(() -> recordsModel.reload(() -> caseModel.refreshList(done)));
        // a failed load must not leave the cover up: the status bar then says why
        session.jobs().runningProperty().addListener(new javafx.beans.value.ChangeListener<>() {
            @Override
            public void changed(javafx.beans.value.ObservableValue<? extends Boolean> o, Boolean a, Boolean running) {
                if (!running && session.jobs().failedProperty().get()) {
                    startOverlay.setVisible(false);
                    o.removeListener(this);
                } else if (!running && !startOverlay.isVisible()) {
                    o.removeListener(this);
                }
            }
        });
    }

    /** True while the first load covers the window (for tests). */
    public boolean starting() {
        return startOverlay.isVisible();
    }

    private VBox startOverlay() {
        javafx.scene.control.ProgressIndicator spin = new javafx.scene.control.ProgressIndicator();
        spin.setMaxSize(56, 56);
        startText.setWrapText(true);
        startText.setMaxWidth(520);
        startText.getStyleClass().add("headline");
        Label status = new Label();
        status.textProperty().bind(session.jobs().messageProperty());
        status.getStyleClass().add("hint");
        VBox v = new VBox(14, spin, startText, status);
        v.setAlignment(Pos.CENTER);
        v.setId("start-overlay");
        v.getStyleClass().add("start-overlay");
        v.setVisible(false);
        return v;
    }

    public void show(Screen s) {
        Node n = paneByScreen.get(s);
        if (n == null) {
            return;
        }
        paneByScreen.forEach((k, v) -> v.setVisible(k == s));
        showing = s;
        if (strip != null) {
            strip.showing(switch (s) {
                case TARGET -> org.cohesa.core.cases.CaseStep.MATERIAL;
                case LIMITS -> org.cohesa.core.cases.CaseStep.LIMITS;
                case BLENDS -> org.cohesa.core.cases.CaseStep.CANDIDATES;
                case CHECKS -> org.cohesa.core.cases.CaseStep.CHECKS;
                case RECORD -> org.cohesa.core.cases.CaseStep.RECORD;
                default -> null;
            });
        }
    }

    public Screen currentScreen() {
        return showing;
    }

    /** Restores the screen, plot settings and target remembered from the last run. */
    public void apply(Settings s) {
        try {
            spaceModel.colouringProperty().set(Colouring.valueOf(s.colourBy));
        } catch (IllegalArgumentException | NullPointerException e) {
            spaceModel.colouringProperty().set(Colouring.FAMILY);
        }
        spaceModel.doubledDdProperty().set(s.doubledDd);
        if (s.hasTarget()) {
            try {
                session.targetProperty().set(new TargetChoice(s.targetName,
                        SolubilitySphere.of(s.targetDd, s.targetDp, s.targetDh, s.targetR0), s.targetSource));
            } catch (IllegalArgumentException e) {
                session.jobs().complain("The remembered target was not valid and was dropped: " + e.getMessage());
            }
        }
        Screen screen = Screen.byKey(s.screen);
        show(screen == null ? Screen.CASES : screen);
    }

    /** Copies the current screen, plot settings and target into {@code s}. */
    public void remember(Settings s) {
        s.screen = currentScreen().key();
        s.colourBy = spaceModel.colouringProperty().get().name();
        s.doubledDd = spaceModel.doubledDdProperty().get();
        TargetChoice t = session.target();
        if (t != null) {
            s.targetName = t.name();
            s.targetSource = t.source();
            s.targetDd = t.sphere().centre().dD();
            s.targetDp = t.sphere().centre().dP();
            s.targetDh = t.sphere().centre().dH();
            s.targetR0 = t.sphere().r0();
        }
    }

    private void addScreen(Screen s, Node content) {
        content.setVisible(false);
        deck.getChildren().add(content);
        paneByScreen.put(s, content);
    }

    private MenuBar menus() {
        Menu file = new Menu("_File");
        MenuItem reload = item("_Reload the library", "F5", e -> libraryModel.reload(null));
        MenuItem quit = item("_Quit", "Shortcut+Q", e -> javafx.application.Platform.exit());
        file.getItems().addAll(reload, new SeparatorMenuItem(), quit);
        Menu view = new Menu("_View");
        int i = 1;
        for (Screen s : paneByScreen.keySet()) {
            view.getItems().add(item("_" + i + " " + s.title(), "Shortcut+" + i, e -> show(s)));
            i++;
        }
        Menu help = new Menu("_Help");
        help.getItems().addAll(
                item("_Safety notice", null, e -> Dialogs.message(root, "Safety notice", SAFETY_NOTICE)),
                item("_Keyboard", null, e -> Dialogs.message(root, "Keyboard",
                        "Ctrl+1…" + paneByScreen.size() + ": the case list, the steps, the reference screens · Ctrl+C: copy the selected rows · F5: reload the library\n"
                                + "Alt + underlined letter: buttons and fields\n"
                                + "3D view: arrow keys rotate, + and − zoom, R resets; drag rotates, the wheel zooms, "
                                + "right- or shift-drag pans")),
                item("_About Cohesa", null, e -> Dialogs.message(root, "About Cohesa",
                        "Cohesa " + version() + " — solvent and blend selection with Hansen solubility parameters.\nDatabase: "
                                + session.databaseFile() + "\n\n" + SAFETY_NOTICE)));
        MenuBar bar = new MenuBar(file, view, help);
        bar.setId("menus");
        return bar;
    }

    private static String version() {
        String v = Workbench.class.getPackage().getImplementationVersion();
        return v == null ? "(development build)" : v;
    }

    private static MenuItem item(String text, String accelerator, javafx.event.EventHandler<javafx.event.ActionEvent> action) {
        MenuItem m = new MenuItem(text);
        if (accelerator != null) {
            m.setAccelerator(KeyCombination.keyCombination(accelerator));
        }
        m.setOnAction(action);
        return m;
    }

    private Node statusBar() {
        Label message = new Label();
        message.setId("status");
        message.textProperty().bind(session.jobs().messageProperty());
        message.setMaxWidth(Double.MAX_VALUE);
        session.jobs().failedProperty().addListener((o, a, bad) -> {
            if (bad) {
                message.getStyleClass().add("status-problem");
            } else {
                message.getStyleClass().remove("status-problem");
            }
        });
        HBox.setHgrow(message, Priority.ALWAYS);
        ProgressBar progress = new ProgressBar();
        progress.setId("job-progress");
        progress.setPrefWidth(160);
        progress.progressProperty().bind(session.jobs().progressProperty());
        progress.visibleProperty().bind(session.jobs().runningProperty());
        progress.managedProperty().bind(progress.visibleProperty());
        Button cancel = new Button("Cancel");
        cancel.setId("job-cancel");
        cancel.setOnAction(e -> session.jobs().cancel());
        cancel.visibleProperty().bind(session.jobs().runningProperty());
        cancel.managedProperty().bind(cancel.visibleProperty());
        Label target = new Label();
        target.setId("status-target");
        target.textProperty().bind(Bindings.createStringBinding(() -> session.target() == null ? "no target"
                : "target: " + session.target().name(), session.targetProperty()));
        target.getStyleClass().add("status-target");
        Label safety = new Label("Screening estimates: the SDS and your safety professionals decide.");
        safety.getStyleClass().add("status-safety");
        HBox bar = new HBox(10, message, progress, cancel, target, safety);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 10, 4, 10));
        bar.getStyleClass().add("status-bar");
        return new VBox(bar);
    }
}
