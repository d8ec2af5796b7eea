package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import javafx.scene.chart.NumberAxis;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import org.cohesa.cli.CliTestSupport;
import org.cohesa.core.blend.CandidatePool;
import org.cohesa.core.blend.ParetoFront;
import org.cohesa.core.blend.ReactiveFlag;
import org.cohesa.core.blend.SoluteCharacter;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.blend.TradeOffChart;
import org.cohesa.desktop.common.TargetChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The candidates follow the command line's rules (issue 11): an acidic material gets no amine solvent, the screen
 * names what was left out and why, and the switch lets them in — the same lists `cohesa blend` gives; and the trade-off
 * chart (RED, hazard, cost) draws every candidate listed, marks the core's Pareto front, and a click on a tile shows
 * that candidate. With {@code -Dcohesa.screenshots=DIR} it writes {@code candidates-tradeoffs-1280x800.png} there.
 */
@ExtendWith(ApplicationExtension.class)
class CandidateRulesTest {

    private DesktopFixture fx;
    private static Path shared;

    @Start
    void start(Stage stage) throws Exception {
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-rules-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    @Test
    void anAcidicMaterialGetsNoAmineAsOnTheCommandLine(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // Salicylic acid (pKa 2.97, CRC Handbook, dissociation constants; from memory) forms a salt with an amine
        // (common practice, no source); its structure in solvent-db/material-structures.csv marks it acidic.
        Material salicylic = fx.session.materials().stream().filter(m -> m.name().equals("salicylic acid")).findFirst().orElseThrow();
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice(salicylic.name(), salicylic.sphere(),
                "material library, source: " + salicylic.source())));
        BlendModel m = fx.workbench.blendModel();
        assertEquals(Set.of(SoluteCharacter.ACIDIC), m.soluteCharacter(), "read from the structure as the command line reads it");
        String said = robot.lookup("#blend-solute-character").queryAs(Label.class).getText();
        assertTrue(said.contains("salicylic acid is acidic") && said.contains("amine"), said);

        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(15);
        });
        assertFalse(rows.isEmpty());
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                assertFalse(ReactiveFlag.AMINE.applies(c.solvent()), "an amine for an acid: " + DesktopFixture.names(List.of(r)));
            }
            assertTrue(String.join("; ", r.suggestion().why()).contains("solute acidic: no amine"), r.suggestion().why().toString());
        }
        // what was left out and why, with the switch, as the command line names them
        Label leftOut = robot.lookup("#blend-left-out").queryAs(Label.class);
        assertTrue(leftOut.isVisible());
        String text = leftOut.getText();
        assertTrue(text.contains("Salt formers, salicylic acid is acidic by its structure") && text.contains("Allow salt formers"), text);
        CliTestSupport.Result cli = CliTestSupport.run(fx.folder.resolve("cohesa.db"), "blend", "--material", "salicylic acid",
                "--max-components", "2", "--top", "15", "--json");
        assertEquals(0, cli.exitCode(), cli.err());
        JsonNode cliLeftOut = cli.json().get("search").get("left_out_names").get(CandidatePool.saltWith(SoluteCharacter.ACIDIC));
        assertNotNull(cliLeftOut, cli.out());
        Set<String> cliNames = new TreeSet<>();
        cliLeftOut.forEach(n -> cliNames.add(n.asText()));
        assertFalse(cliNames.isEmpty());
        for (String n : cliNames) {
            assertTrue(text.contains(n), n + " is left out on the command line and must be named on the screen: " + text);
        }
        assertEquals(DesktopFixture.names(cli.json().get("blends")), DesktopFixture.names(rows), "the same candidates, in the same order, as `cohesa blend`");

        assertTrue(m.leftOutBySafety().get(0).startsWith("Salt formers"), "the material's own rule comes first, before the lists every search has");
        // the switch lets them in, as --allow-salt-formers does
        List<BlendModel.Row> allowed = fx.searchCandidates(robot, () -> robot.lookup("#blend-allow-salt-formers").queryAs(CheckBox.class).setSelected(true));
        assertEquals("true", m.limits().get("allow-salt-formers"), "stored with the case's limits");
        assertTrue(allowed.stream().noneMatch(r -> String.join("; ", r.suggestion().why()).contains("solute acidic")));
        assertTrue(fx.workbench.blendModel().leftOutBySafety().stream().anyMatch(l -> l.contains("take part because “Allow salt formers” is ticked")));
        CliTestSupport.Result cliAllowed = CliTestSupport.run(fx.folder.resolve("cohesa.db"), "blend", "--material", "salicylic acid",
                "--max-components", "2", "--top", "15", "--allow-salt-formers", "--json");
        assertEquals(DesktopFixture.names(cliAllowed.json().get("blends")), DesktopFixture.names(allowed), "the same candidates as `cohesa blend --allow-salt-formers`");
        assertFalse(cliAllowed.json().get("search").get("left_out_names").has(CandidatePool.saltWith(SoluteCharacter.ACIDIC)));
        robot.interact(() -> m.allowSaltFormers.set(false));

        // a typed-in sphere has no structure: nothing is left out for salt formation, and the form says why
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice("demo sphere (invented)", SolubilitySphere.of(17.5, 8, 9, 8), "typed in")));
        assertTrue(m.soluteCharacter().isEmpty());
        assertTrue(robot.lookup("#blend-solute-character").queryAs(Label.class).getText().contains("No structure is known"));
    }

    @Test
    void theTradeOffChartDrawsTheCoresFrontAndPicksACandidate(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        BlendModel m = fx.workbench.blendModel();
        robot.interact(() -> {
            m.allowSaltFormers.set(false);
            fx.session.targetProperty().set(new TargetChoice("demo resin (invented)", SolubilitySphere.of(18.5, 9, 8, 8), "typed in"));
        });
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(3);
            m.top.set(20);
        });
        assertTrue(rows.size() >= 5, "enough candidates for a trade-off: " + rows.size());
        TradeOffChart chart = fx.workbench.blendView().tradeOffs();
        robot.interact(() -> fx.workbench.blendView().showTradeOffs());
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();

        // every candidate is one tile, and the filled ones are exactly the core's front (ParetoFront, docs/desktop.md)
        List<ParetoFront.Point> front = ParetoFront.of(rows.stream().map(r -> r.suggestion().blend()).toList());
        Set<Integer> expected = new TreeSet<>();
        for (BlendModel.Row r : rows) {
            if (front.stream().anyMatch(p -> p.blend().equals(r.suggestion().blend()))) {
                expected.add(r.rank());
            }
            StackPane tile = chart.tileOf(r.rank());
            assertNotNull(tile, "tile of #" + r.rank());
            assertTrue(tile.getStyleClass().contains(expected.contains(r.rank()) ? "tradeoff-tile-front" : "tradeoff-tile-beaten"));
        }
        assertEquals(expected, new TreeSet<>(chart.frontRanks()));
        assertFalse(expected.isEmpty());
        // a candidate not on the front really is beaten: some other candidate is no worse on RED and hazard (no prices here)
        for (BlendModel.Row r : rows) {
            if (!expected.contains(r.rank())) {
                ParetoFront.Point p = ParetoFront.score(r.suggestion().blend());
                assertTrue(rows.stream().map(q -> ParetoFront.score(q.suggestion().blend()))
                        .anyMatch(q -> q.red() <= p.red() && q.hazard() <= p.hazard() && (q.red() < p.red() || q.hazard() < p.hazard())),
                        "#" + r.rank() + " is drawn as beaten");
            }
        }
        // the axes in the trade's words; cost is not drawn without prices and the screen says why
        assertTrue(((NumberAxis) chart.hazardChart().getXAxis()).getLabel().startsWith("RED"));
        assertTrue(((NumberAxis) chart.hazardChart().getYAxis()).getLabel().startsWith("Hazard score"));
        assertFalse(chart.costChart().isVisible());
        String costNote = robot.lookup("#tradeoff-cost-note").queryAs(Label.class).getText();
        assertTrue(costNote.contains("Cost is not drawn") && costNote.contains("without a price"), costNote);
        // each tile sits where its scores put it; the one checked and clicked is the last candidate whose mark no other covers
        BlendModel.Row last = null;
        for (BlendModel.Row r : rows) {
            javafx.geometry.Bounds b = chart.tileOf(r.rank()).localToScene(chart.tileOf(r.rank()).getBoundsInLocal());
            boolean alone = rows.stream().filter(q -> q != r).noneMatch(q -> chart.tileOf(q.rank())
                    .localToScene(chart.tileOf(q.rank()).getBoundsInLocal()).intersects(b));
            if (alone && !expected.contains(r.rank())) {
                last = r;
            }
        }
        assertNotNull(last, "a mark no other covers");
        StackPane lastTile = chart.tileOf(last.rank());
        NumberAxis x = (NumberAxis) chart.hazardChart().getXAxis();
        double[] drawnRed = new double[1];
        robot.interact(() -> {
            javafx.geometry.Point2D centre = lastTile.localToScene(lastTile.getWidth() / 2, lastTile.getHeight() / 2);
            drawnRed[0] = x.getValueForDisplay(x.sceneToLocal(centre).getX()).doubleValue();
        });
        assertEquals(last.suggestion().blend().red(), drawnRed[0], 0.02, "the tile of #" + last.rank() + " is drawn at its RED");

        // a click on a tile selects that candidate's card, and the selected card's tile is framed
        robot.clickOn(lastTile);
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        ListView<BlendModel.Row> cards = robot.lookup("#blend-cards").queryAs(ListView.class);
        assertEquals(last.rank(), cards.getSelectionModel().getSelectedItem().rank(), "a click on the mark of #" + last.rank());
        assertTrue(lastTile.getStyleClass().contains("tradeoff-tile-selected"));
        robot.interact(() -> cards.getSelectionModel().clearAndSelect(0));
        assertTrue(chart.tileOf(rows.get(0).rank()).getStyleClass().contains("tradeoff-tile-selected"));
        assertFalse(lastTile.getStyleClass().contains("tradeoff-tile-selected"));
        // the screenshot shows a candidate of the front picked on the chart, its card scrolled into view
        robot.clickOn(chart.tileOf(expected.iterator().next()));
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        assertEquals(expected.iterator().next(), cards.getSelectionModel().getSelectedItem().rank());
        screenshot(robot, "candidates-tradeoffs-1280x800");

        // with a price on every solvent, cost joins the front and gets its own chart (prices invented for the test)
        List<Solvent> priced = new ArrayList<>();
        int i = 0;
        for (Solvent s : fx.session.solvents()) {
            priced.add(s.withPricePerLitre(2.0 + (i++ % 7)));
        }
        robot.interact(() -> fx.session.solvents().setAll(priced));
        List<BlendModel.Row> withPrices = fx.searchCandidates(robot, () -> { });
        assertTrue(chart.costChart().isVisible());
        assertTrue(((NumberAxis) chart.costChart().getYAxis()).getLabel().startsWith("Cost per litre"));
        List<ParetoFront.Point> front3 = ParetoFront.of(withPrices.stream().map(r -> r.suggestion().blend()).toList());
        assertEquals(front3.size(), chart.frontRanks().size(), "the front over RED, hazard and cost");
    }

    private void screenshot(FxRobot robot, String name) {
        String dir = System.getProperty("cohesa.screenshots");
        if (dir == null || dir.isBlank()) {
            return;
        }
        robot.interact(() -> Snapshots.savePng(fx.workbench.root().getScene().snapshot(null), Path.of(dir, name + ".png")));
    }
}
