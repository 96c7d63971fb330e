package org.rcbench.gui.view;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;
import org.rcbench.common.BadInputException;

/** Saves what a scene shows as a PNG file. Window thread only. */
public final class WindowPicture {
    private WindowPicture() {
    }

    /**
     * Renders {@code scene} and writes it to {@code file} as PNG; returns the image's width and height.
     *
     * @throws BadInputException naming the file when it cannot be written
     */
    public static int[] write(Scene scene, Path file) {
        WritableImage image = scene.snapshot(null);
        BufferedImage rgb = new BufferedImage((int) image.getWidth(), (int) image.getHeight(),
                BufferedImage.TYPE_INT_RGB);
        SwingFXUtils.fromFXImage(image, rgb);
        try {
            if (!ImageIO.write(rgb, "png", file.toFile())) {
                throw new BadInputException(file.toString(), "no PNG writer in this Java");
            }
        } catch (IOException e) {
            throw new BadInputException(file.toString(), "cannot write the picture: " + e.getMessage());
        }
        return new int[] {rgb.getWidth(), rgb.getHeight()};
    }
}
