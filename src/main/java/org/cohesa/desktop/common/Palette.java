package org.cohesa.desktop.common;

import javafx.scene.paint.Color;

/**
 * Cohesa's colours. Data colours are drawn from the Okabe–Ito set (Okabe, M. and Ito, K., "Color Universal
 * Design", 2008), chosen because its eight hues stay distinguishable for the common forms of colour-vision
 * deficiency; our own assignment of meanings to them is documented in docs/desktop.md. Plots use a dark
 * "ink" background so the light hues (yellow, sky blue) stay visible; pure black from the set is replaced
 * by a light grey on that background.
 */
public final class Palette {

    public static final Color ORANGE = Color.web("#E69F00");
    public static final Color SKY_BLUE = Color.web("#56B4E9");
    public static final Color BLUISH_GREEN = Color.web("#009E73");
    public static final Color YELLOW = Color.web("#F0E442");
    public static final Color BLUE = Color.web("#3C8FD0");
    public static final Color VERMILLION = Color.web("#D55E00");
    public static final Color REDDISH_PURPLE = Color.web("#CC79A7");
    public static final Color LIGHT = Color.web("#E8E8E8");
    /** No data (e.g. a solvent without the property the colouring needs). */
    public static final Color NO_DATA = Color.web("#7D8894");

    /** Plot background, axes, grid and text on it. */
    public static final Color INK = Color.web("#1B222C");
    public static final Color AXIS = Color.web("#C9D1DA");
    public static final Color GRID = Color.web("#323C49");
    public static final Color TEXT = Color.web("#E6EAEE");

    /** Marks drawn over the data: the selected solvent, the selected blend and its drying path. */
    public static final Color SELECTION = Color.WHITE;
    public static final Color BLEND = Color.web("#FFD166");
    public static final Color TARGET = Color.web("#56B4E9");

    private Palette() {
    }

    /** CSS hex form, e.g. "#e69f00". */
    public static String css(Color c) {
        return String.format("#%02x%02x%02x", Math.round(c.getRed() * 255), Math.round(c.getGreen() * 255),
                Math.round(c.getBlue() * 255));
    }
}
