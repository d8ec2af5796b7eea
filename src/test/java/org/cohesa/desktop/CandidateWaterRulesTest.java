package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import javafx.stage.Stage;
import org.cohesa.cli.CliTestSupport;
import org.cohesa.core.activity.WaterBehaviour;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.blend.ProcessUse;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.WaterMiscibilityCsv;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The candidates follow the command line's water rules (issue 11), from the same core code: no water in the solution of
 * a polymer water does not dissolve (PVDF: `cohesa blend --material PVDF` gives the same list), and a case that replaces
 * dichloromethane asks every candidate to separate from water as dichloromethane does (as `cohesa replace` does).
 */
@ExtendWith(ApplicationExtension.class)
class CandidateWaterRulesTest {

    private DesktopFixture fx;
    private static Path shared;

    @Start
    void start(Stage stage) throws Exception {
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-water-rules-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    @Test
    void noWaterInAPvdfSolutionAsOnTheCommandLine(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // PVDF's sphere leaves water far outside (RED > 4 with the bundled sphere); water is the non-solvent PVDF membranes
        // are precipitated with (common practice, no source)
        Material pvdf = fx.session.materials().stream().filter(m -> m.name().startsWith("poly(vinylidene fluoride)")).findFirst().orElseThrow();
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice(pvdf.name(), pvdf.sphere(),
                "material library, source: " + pvdf.source())));
        BlendModel m = fx.workbench.blendModel();
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(10);
        });
        assertFalse(rows.isEmpty());
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                assertFalse(WaterMiscibility.isWater(c.solvent()), "water in a PVDF solution: " + DesktopFixture.names(List.of(r)));
            }
        }
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("water left out") && l.contains("Include only")),
                m.leftOutBySafety().toString());
        CliTestSupport.Result cli = CliTestSupport.run(fx.folder.resolve("cohesa.db"), "blend", "--material", pvdf.name(),
                "--max-components", "2", "--top", "10", "--json");
        assertEquals(0, cli.exitCode(), cli.err());
        assertEquals(DesktopFixture.names(cli.json().get("blends")), DesktopFixture.names(rows), "the same candidates, in the same order, as `cohesa blend`");
    }

    @Test
    void aDichloromethaneCaseGetsCandidatesThatSeparateFromWater(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        List<Solvent> lib = List.copyOf(fx.session.solvents());
        Solvent dcm = lib.stream().filter(s -> s.name().equals("dichloromethane")).findFirst().orElseThrow();
        Solvent water = lib.stream().filter(WaterMiscibility::isWater).findFirst().orElseThrow();
        BlendModel m = fx.workbench.blendModel();
        robot.interact(() -> {
            fx.session.replacingProperty().set("dichloromethane");
            fx.session.targetProperty().set(new TargetChoice("around dichloromethane", SolubilitySphere.of(dcm.hansen().dD(),
                    dcm.hansen().dP(), dcm.hansen().dH(), 4), "typed in"));
        });
        assertEquals(ProcessUse.AS_ORIGINAL, m.process.get(), "a replacement case ranks as the replaced liquid");
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(10);
        });
        assertFalse(rows.isEmpty());
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("with water as the replaced liquid: dichloromethane is immiscible")),
                m.leftOutBySafety().toString());
        for (BlendModel.Row r : rows) {
            List<Solvent> comps = r.blend().components().stream().map(BlendComponent::solvent).toList();
            double[] f = r.blend().components().stream().mapToDouble(BlendComponent::fraction).toArray();
            WaterBehaviour wb = WaterMiscibility.withWater(comps, f, water, 298.15, WaterMiscibilityCsv.bundled());
            assertEquals(WaterBehaviour.Kind.IMMISCIBLE, wb.kind(), DesktopFixture.names(List.of(r)) + " must separate from water: " + wb.detail());
        }
        // 1,3-dioxolane mixes with water (it led the list before the rule): not a candidate here
        assertTrue(DesktopFixture.names(rows).stream().noneMatch(n -> n.contains("1,3-dioxolane")), DesktopFixture.names(rows).toString());
        robot.interact(() -> fx.session.replacingProperty().set(""));
    }
}
