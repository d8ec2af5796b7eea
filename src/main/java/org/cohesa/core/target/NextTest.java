package org.cohesa.core.target;

/**
 * A library liquid worth testing next.
 *
 * @param name        library name
 * @param red         RED to the fitted sphere
 * @param insideShare share of the bootstrap spheres that hold the liquid (near 0.5 = the fits disagree most)
 * @param reason      one plain sentence saying why
 */
public record NextTest(String name, double red, double insideShare, String reason) {
}
