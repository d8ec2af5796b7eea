package org.cohesa.desktop.structure;

import java.awt.Color;
import java.awt.image.BufferedImage;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.Image;
import org.cohesa.core.structure.Structure;
import org.openscience.cdk.depict.DepictionGenerator;
import org.openscience.cdk.exception.CDKException;

/**
 * A 2D drawing of a structure by CDK's depiction module (layout by its structure-diagram generator, heteroatoms
 * coloured, hydrogens on heteroatoms shown, carbons as line vertices), converted to a JavaFX image. Safe to call
 * off the FX thread: it only draws into a BufferedImage.
 */
public final class StructureDrawing {

    private StructureDrawing() {
    }

    /**
     * Draws {@code structure} scaled to fit {@code width} × {@code height} pixels on white.
     *
     * @throws IllegalStateException when CDK cannot lay the molecule out (the message says why)
     */
    public static Image draw(Structure structure, int width, int height) {
        return SwingFXUtils.toFXImage(bufferedImage(structure, width, height), null);
    }

    static BufferedImage bufferedImage(Structure structure, int width, int height) {
        try {
            return new DepictionGenerator()
                    .withSize(width, height)
                    .withFillToFit()
                    .withAtomColors()
                    .withTerminalCarbons()
                    .withBackgroundColor(Color.WHITE)
                    .depict(structure.copyOfMolecule())
                    .toImg();
        } catch (CDKException e) {
            throw new IllegalStateException("the structure could not be drawn (" + e.getMessage() + ")", e);
        }
    }
}
