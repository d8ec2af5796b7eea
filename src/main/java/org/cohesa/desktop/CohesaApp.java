package org.cohesa.desktop;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import javafx.animation.PauseTransition;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.Settings;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.DataHome;

/**
 * The desktop workbench. Remembers the window, the screen, the plot settings and the target between runs
 * ({@link Settings}). See {@link StartOptions} for the screenshot and frame-measurement modes.
 */
public final class CohesaApp extends Application {

    private Workbench workbench;
    private Settings settings;
    private Path settingsFile;
    private Stage stage;

    @Override
    public void start(Stage primary) {
        this.stage = primary;
        StartOptions opts;
        try {
            opts = StartOptions.parse(getParameters().getNamed());
        } catch (IllegalArgumentException e) {
            System.err.println("error: " + e.getMessage());
            Platform.exit();
            return;
        }
        Path db = DataHome.defaultDatabase();
        settingsFile = db.resolveSibling(Settings.FILE_NAME);
        settings = Settings.load(settingsFile);
        Session session = new Session(db);
        Thread.setDefaultUncaughtExceptionHandler((t, e) -> session.jobs().complain(ErrorText.of(e)));
        workbench = new Workbench(session);
        boolean scripted = opts.screenshot() != null || opts.measurePoints() > 0;
        double w = scripted ? opts.width() : settings.windowWidth;
        double h = scripted ? opts.height() : settings.windowHeight;
        Scene scene = new Scene(workbench.root(), w, h);
        scene.getStylesheets().add(CohesaApp.class.getResource("cohesa.css").toExternalForm());
        primary.setTitle("Cohesa — solvent and blend workbench");
        primary.setScene(scene);
        if (!scripted) {
            if (!Double.isNaN(settings.windowX) && !Double.isNaN(settings.windowY)) {
                primary.setX(settings.windowX);
                primary.setY(settings.windowY);
            }
            primary.setMaximized(settings.maximized);
            primary.setOnCloseRequest(e -> saveSettings());
        }
        workbench.apply(settings);
        primary.show();
        workbench.load(() -> afterLoad(opts, scene));
    }

    @Override
    public void stop() {
        if (workbench != null && settingsFile != null && stage != null && stage.isShowing()) {
            saveSettings();
        }
    }

    private void afterLoad(StartOptions opts, Scene scene) {
        Session session = workbench.session();
        if (opts.caseReplacing() != null) {
            try {
                workbench.caseModel().start("Replace " + opts.caseReplacing() + " (invented demo case)", org.cohesa.core.cases.SubstitutionCase.Kind.REPLACE,
                        opts.caseReplacing(), "demo process (invented)");
            } catch (RuntimeException e) {
                System.err.println("error: " + ErrorText.of(e));
            }
        }
        if (opts.target() != null) {
            session.targetProperty().set(new TargetChoice("typed-in sphere", opts.target(), "typed in"));
        }
        if (opts.select() != null) {
            session.solvents().stream().filter(s -> s.name().equalsIgnoreCase(opts.select())).findFirst()
                    .ifPresent(s -> session.selectedSolventProperty().set(s));
        }
        if (opts.screen() != null) {
            workbench.show(opts.screen());
        }
        if (opts.view() >= 0) {
            workbench.spaceView().showView(opts.view());
        }
        if (opts.turn() != null) {
            workbench.spaceView().view3d().rotateBy(opts.turn()[0], opts.turn()[1]);
            workbench.spaceView().view3d().fitToFrame();
        }
        if (opts.search() > 0) {
            workbench.blendModel().maxComponents.set(opts.search());
            try {
                workbench.blendModel().search(() -> {
                    var rows = workbench.blendModel().rows();
                    if (opts.caseReplacing() != null && !rows.isEmpty()) {
                        workbench.caseModel().choose(List.copyOf(rows.subList(0, Math.min(2, rows.size()))));
                        workbench.caseModel().runChecks(() -> {
                            if (opts.screen() == Screen.RECORD) {
                                fileDemoRecord(opts, scene);
                            } else {
                                finish(opts, scene);
                            }
                        });
                    } else {
                        finish(opts, scene);
                    }
                });
            } catch (RuntimeException e) {
                System.err.println("error: " + ErrorText.of(e));
                finish(opts, scene);
            }
        } else if (opts.blend() != null) {
            workbench.dryingModel().blendTextProperty().set(opts.blend());
            workbench.dryingModel().run(() -> finish(opts, scene), () -> finish(opts, scene));
        } else {
            finish(opts, scene);
        }
    }

    /** The demo case's record, filed from its Record step (for the screenshot of that step; the texts say they are invented). */
    private void fileDemoRecord(StartOptions opts, Scene scene) {
        var chosen = workbench.caseModel().current().chosen();
        try {
            workbench.caseModel().fileRecord(new org.cohesa.desktop.records.RecordsModel.Filing("demo process (invented)",
                    "demo site (fictional)", opts.caseReplacing(), chosen.get(0).blend(), "invented demo: the Record step of a case",
                    "R. Formulator (demo)", true), () -> finish(opts, scene));
        } catch (RuntimeException e) {
            System.err.println("error: " + ErrorText.of(e));
            finish(opts, scene);
        }
    }

    private void finish(StartOptions opts, Scene scene) {
        if (opts.measurePoints() > 0) {
            measure(opts.measurePoints());
        } else if (opts.screenshot() != null) {
            PauseTransition wait = new PauseTransition(Duration.seconds(1.5));
            wait.setOnFinished(e -> {
                Snapshots.savePng(scene.snapshot(null), opts.screenshot());
                Platform.exit();
            });
            wait.play();
        }
    }

    /** Rotates the 3D view with {@code points} points for 8 s and prints the frame intervals (ms). */
    private void measure(int points) {
        int library = workbench.spaceModel().points().size();
        workbench.spaceModel().addSyntheticPoints(Math.max(0, points - library));
        workbench.show(Screen.SPACE);
        workbench.spaceView().showView(0);
        PauseTransition settle = new PauseTransition(Duration.seconds(1.5));
        long[] cpuAtStart = new long[1];
        settle.setOnFinished(e -> workbench.spaceView().view3d().measureFrames(10, () -> cpuAtStart[0] = processCpuNanos(), ms -> {
            // CPU time the whole process spent per frame (all threads, rendering included): unlike the interval it
            // hardly depends on what else the machine runs, so it compares runs taken under different loads
            double cpuPerFrame = (processCpuNanos() - cpuAtStart[0]) / 1e6 / Math.max(1, ms.length);
            double[] sorted = ms.clone();
            Arrays.sort(sorted);
            double median = sorted.length == 0 ? Double.NaN : sorted[sorted.length / 2];
            double p95 = sorted.length == 0 ? Double.NaN : sorted[(int) Math.floor(sorted.length * 0.95)];
            double max = sorted.length == 0 ? Double.NaN : sorted[sorted.length - 1];
            System.out.println("intervals_ms=" + Arrays.toString(Arrays.stream(ms).map(Math::round).toArray()));
            javafx.scene.canvas.Canvas canvas = workbench.spaceView().view3d().canvas();
            // the load average beside the figures: on a shared machine they mean little without it
            System.out.printf(Locale.ROOT,
                    "points=%d frames=%d median_ms=%.1f p95_ms=%.1f max_ms=%.1f median_fps=%.1f cpu_ms_per_frame=%.1f view=%.0fx%.0f load1=%.2f%n",
                    workbench.spaceView().view3d().pointCount(), ms.length, median, p95, max, 1000 / median, cpuPerFrame,
                    canvas.getWidth(), canvas.getHeight(),
                    java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            Platform.exit();
        }));
        settle.play();
    }

    /** CPU time of this process so far (ns), or 0 where the platform does not say. */
    private static long processCpuNanos() {
        if (java.lang.management.ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return Math.max(0, os.getProcessCpuTime());
        }
        return 0;
    }

    private void saveSettings() {
        settings.maximized = stage.isMaximized();
        if (!stage.isMaximized()) {
            settings.windowX = stage.getX();
            settings.windowY = stage.getY();
            settings.windowWidth = stage.getWidth();
            settings.windowHeight = stage.getHeight();
        }
        workbench.remember(settings);
        try {
            settings.save(settingsFile);
        } catch (IOException | RuntimeException e) {
            System.err.println("cohesa: could not save the window settings: " + e.getMessage());
        }
    }
}
