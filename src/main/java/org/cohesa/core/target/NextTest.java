package org.cohesa.core.target;

/**
 * A library liquid worth testing next.
 *
 * @param name              library name
 * @param red               RED to the fitted sphere
 * @param insideShare       share of the plausible spheres (bootstrap or region samples) that hold the liquid:
 *                          near 0.5 the fits disagree most
 * @param reason            one plain sentence saying why
 * @param expectedShrinkage likelihood fit only: how much the region's spread (RMS of centre in Ra and R0, MPa^½)
 *                          is expected to shrink once this test and the ones listed before it are scored, as a
 *                          fraction of the spread now (0 for the other methods)
 */
public record NextTest(String name, double red, double insideShare, String reason, double expectedShrinkage) {

    public NextTest(String name, double red, double insideShare, String reason) {
        this(name, red, insideShare, reason, 0);
    }
}
