package org.cohesa.desktop.space;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javafx.beans.Observable;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;

/**
 * View-model of the parameter-space plots (3D, the three projections and the Teas triangle): which points
 * are drawn and how they are coloured, the axis ranges, whether δD is doubled. The views only draw what
 * this model says.
 */
public final class SpaceModel {

    private final Session session;
    private final ObjectProperty<Colouring> colouring = new SimpleObjectProperty<>(Colouring.FAMILY);
    private final BooleanProperty doubledDd = new SimpleBooleanProperty(true);
    private final ReadOnlyObjectWrapper<List<PlotPoint>> points = new ReadOnlyObjectWrapper<>(List.of());
    private final ReadOnlyObjectWrapper<AxisRanges> ranges = new ReadOnlyObjectWrapper<>(AxisRanges.DEFAULT);
    private List<Solvent> syntheticPoints = List.of();

    public SpaceModel(Session session) {
        this.session = session;
        Observable[] inputs = {session.solvents(), session.targetProperty(), colouring};
        for (Observable o : inputs) {
            o.addListener(x -> rebuild());
        }
        rebuild();
    }

    public Session session() {
        return session;
    }

    public ObjectProperty<Colouring> colouringProperty() {
        return colouring;
    }

    /** True: the δD axis shows 2δD, so a solubility sphere is round (Hansen 2007, ch. 1). */
    public BooleanProperty doubledDdProperty() {
        return doubledDd;
    }

    public ReadOnlyObjectProperty<List<PlotPoint>> pointsProperty() {
        return points.getReadOnlyProperty();
    }

    public List<PlotPoint> points() {
        return points.get();
    }

    public ReadOnlyObjectProperty<AxisRanges> rangesProperty() {
        return ranges.getReadOnlyProperty();
    }

    public SolubilitySphere targetSphere() {
        TargetChoice t = session.target();
        return t == null ? null : t.sphere();
    }

    /**
     * Adds {@code count} invented points spread like the library (each a library solvent's parameters with
     * a random offset of up to ±1.5 MPa^½, fixed seed), used only to measure how the 3D view copes with many
     * points. They are labelled as invented and never enter any computation.
     */
    public void addSyntheticPoints(int count) {
        List<Solvent> base = session.solvents().stream().filter(Solvent::hasHansen).toList();
        if (base.isEmpty() || count <= 0) {
            return;
        }
        Random rnd = new Random(20261201L);
        List<Solvent> out = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            Solvent b = base.get(rnd.nextInt(base.size()));
            HansenParameters h = b.hansen();
            HansenParameters p = new HansenParameters(Math.max(0, h.dD() + jitter(rnd)), Math.max(0, h.dP() + jitter(rnd)),
                    Math.max(0, h.dH() + jitter(rnd)));
            out.add(new Solvent("invented test point " + (i + 1), List.of(), null, null, null, b.family(), null, null, null, null, p,
                    null, null, null, null, null, null, b.hazardStatements(), false, b.ichClass(), null, null, null,
                    "invented for the frame-time measurement", false));
        }
        syntheticPoints = out;
        rebuild();
    }

    private static double jitter(Random rnd) {
        return (rnd.nextDouble() * 2 - 1) * 1.5;
    }

    private void rebuild() {
        SolubilitySphere target = targetSphere();
        Colouring c = colouring.get();
        List<PlotPoint> out = new ArrayList<>();
        for (Solvent s : session.solvents()) {
            add(out, s, c, target, s);
        }
        for (Solvent s : syntheticPoints) {
            add(out, s, c, target, null);
        }
        // ranges first: the views redraw when the points change and read the ranges then
        ranges.set(AxisRanges.cover(out.stream().map(PlotPoint::hansen).toList(), target));
        points.set(List.copyOf(out));
    }

    private static void add(List<PlotPoint> out, Solvent s, Colouring c, SolubilitySphere target, Solvent libraryEntry) {
        if (!s.hasHansen()) {
            return;
        }
        Double red = target == null ? null : target.red(s.hansen());
        out.add(new PlotPoint(s.name(), s.hansen(), c.categoryOf(s, target), libraryEntry, red));
    }
}
