package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.cohesa.core.solvent.BlendComponent;

/**
 * The trade-off view for the app: blends that no other blend beats on all of RED, hazard score and price at
 * once (Pareto-optimal, lower is better on each). Price joins only when every blend has prices for all its
 * components; otherwise the front is over RED and hazard alone.
 */
public final class ParetoFront {

    /** One blend with its three scores; {@code cost} is NaN when a component has no price. */
    public record Point(RankedBlend blend, double red, double hazard, double cost) {
    }

    private ParetoFront() {
    }

    /** Scores of a blend: RED, volume-fraction-weighted {@link HazardScore}, Σ φᵢ·priceᵢ (NaN without prices). */
    public static Point score(RankedBlend b) {
        double hazard = 0;
        double cost = 0;
        for (BlendComponent c : b.components()) {
            hazard += c.fraction() * HazardScore.of(c.solvent());
            cost += c.solvent().pricePerLitre() == null ? Double.NaN : c.fraction() * c.solvent().pricePerLitre();
        }
        return new Point(b, b.red(), hazard, cost);
    }

    /** The non-dominated blends, ordered by RED. */
    public static List<Point> of(List<RankedBlend> blends) {
        List<Point> pts = blends.stream().map(ParetoFront::score).toList();
        boolean withCost = pts.stream().noneMatch(p -> Double.isNaN(p.cost()));
        List<Point> front = new ArrayList<>();
        for (Point p : pts) {
            boolean dominated = false;
            for (Point q : pts) {
                if (q != p && dominates(q, p, withCost)) {
                    dominated = true;
                    break;
                }
            }
            if (!dominated) {
                front.add(p);
            }
        }
        front.sort(Comparator.comparingDouble(Point::red));
        return front;
    }

    /** q dominates p: no worse on every score and better on at least one. */
    static boolean dominates(Point q, Point p, boolean withCost) {
        boolean noWorse = q.red() <= p.red() && q.hazard() <= p.hazard() && (!withCost || q.cost() <= p.cost());
        boolean better = q.red() < p.red() || q.hazard() < p.hazard() || (withCost && q.cost() < p.cost());
        return noWorse && better;
    }
}
