package org.cohesa.core.drying;

import java.util.List;
import org.cohesa.core.activity.WaterJudgement;

/**
 * The result of a drying simulation.
 *
 * @param points            path points from 0 to the requested evaporated fraction (plus the point where RED crosses 1)
 * @param leavesSphereAt    evaporated fraction where RED first rises through 1, 0 when the blend starts outside, null
 *                          when it stays inside (or without a target)
 * @param lastSolvent       the solvent with the largest volume fraction at the end of the path
 * @param model             the activity model that served
 * @param modelNote         why a fallback model served (empty otherwise)
 * @param exhausted         components practically gone before the end (less than {@link DryingSimulator#PRACTICALLY_GONE} of
 *                          their initial volume left), in the order they go
 * @param splitsAt          evaporated fraction of the first reported point predicted to split into two liquids, or null
 *                          (only when the request asked for miscibility checks)
 * @param phases            the liquid–liquid judgement at that first split point, or at the start when none splits
 *                          (says whether published water data or the model decided); null without miscibility checks
 * @param notes             caveats: estimated vapour pressures, a target not reached
 * @param massBalanceError  max over components of |remaining + evaporated − initial| volume, fraction of the initial volume
 */
public record DryingPath(List<PathPoint> points, Double leavesSphereAt, String lastSolvent, String model, String modelNote,
                         List<Exhaustion> exhausted, Double splitsAt, WaterJudgement phases, List<String> notes,
                         double massBalanceError) {

    /** A component that is practically gone: its name, and the evaporated fraction and relative time at that moment. */
    public record Exhaustion(String solvent, double evaporated, double time) {
    }

    public DryingPath {
        points = List.copyOf(points);
        exhausted = List.copyOf(exhausted);
        notes = List.copyOf(notes);
    }

    /** The last point of the path. */
    public PathPoint end() {
        return points.get(points.size() - 1);
    }
}
