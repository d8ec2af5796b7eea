package org.cohesa.core.hsp;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The parameter panel's geometry against the Hansen distance (Hansen, Hansen Solubility Parameters: A User's Handbook,
 * 2nd ed., CRC Press 2007, ch. 1: Ra² = 4ΔδD² + ΔδP² + ΔδH², RED = Ra/R0); the numbers are worked by hand.
 */
class InsideOutTest {

    private static final SolubilitySphere T = SolubilitySphere.of(18.0, 10.0, 8.0, 8.0);

    @Test
    void sharesSplitRaSquaredByAxisAndTheMarginIsTheDistanceToTheSurface() {
        // ΔδD = 1 (4·1 = 4), ΔδP = 2 (4), ΔδH = 2√2 (8): Ra² = 16, Ra = 4, RED 0.5, margin 4 MPa½
        InsideOut.Standing s = InsideOut.standing(T, new HansenParameters(19.0, 12.0, 8.0 + 2 * Math.sqrt(2)));
        assertEquals(0.5, s.red(), 1e-12);
        assertEquals(T.red(new HansenParameters(19.0, 12.0, 8.0 + 2 * Math.sqrt(2))), s.red(), 1e-12);
        assertEquals(4.0, s.margin(), 1e-12);
        assertEquals(0.25, s.shareD(), 1e-12);
        assertEquals(0.25, s.shareP(), 1e-12);
        assertEquals(0.5, s.shareH(), 1e-12);
        assertEquals("δH", s.mainAxis());
        InsideOut.Standing out = InsideOut.standing(T, new HansenParameters(18.0, 22.0, 8.0)); // ΔδP = 12: RED 1.5
        assertEquals(1.5, out.red(), 1e-12);
        assertEquals(-4.0, out.margin(), 1e-12);
        assertEquals("δP", out.mainAxis());
    }

    @Test
    void theBestPlaneIsTheOneTheCandidatesSpreadIn() {
        // points that differ in δP and δH only: δP–δH shows them; points that differ in δD and δP: 2δD–δP
        List<HansenParameters> ph = List.of(new HansenParameters(18, 4, 12), new HansenParameters(18, 14, 3), new HansenParameters(18.1, 9, 9));
        assertEquals(InsideOut.Plane.P_H, InsideOut.bestPlane(T, ph));
        List<HansenParameters> dp = List.of(new HansenParameters(15, 4, 8), new HansenParameters(20, 14, 8.2));
        assertEquals(InsideOut.Plane.D_P, InsideOut.bestPlane(T, dp));
        assertEquals(InsideOut.Plane.P_H, InsideOut.bestPlane(T, List.of()));
    }

    @Test
    void aSliceThroughAPointCutsTheSphereInACircleOfTheRightRadius() {
        // δP–δH plane through a point 2·ΔδD = 4.8 off: √(8² − 4.8²) = 6.4; a point 10 off misses the sphere
        assertEquals(6.4, InsideOut.sliceRadius(T, InsideOut.Plane.P_H, new HansenParameters(20.4, 10, 8)), 1e-12);
        assertEquals(0.0, InsideOut.sliceRadius(T, InsideOut.Plane.P_H, new HansenParameters(23.0, 10, 8)), 0);
        assertEquals(8.0, InsideOut.sliceRadius(T, InsideOut.Plane.D_H, new HansenParameters(18, 10, 1)), 1e-12);
        assertEquals(36.0, InsideOut.Plane.D_P.x(new HansenParameters(18, 10, 8)), 0);
    }
}
