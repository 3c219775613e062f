package org.sectio.viewer.ui;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javafx.scene.image.Image;
import javafx.scene.image.PixelReader;
import javafx.scene.image.PixelWriter;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;
import org.sectio.io.AtomicFile;

/** Moves pictures between JavaFX and Java 2D and writes them as PNG, atomically. */
public final class FxImages {

    private FxImages() {
    }

    /** @return a JavaFX copy of a Java 2D picture */
    public static WritableImage toFx(BufferedImage image) {
        int w = image.getWidth();
        int h = image.getHeight();
        int[] argb = image.getRGB(0, 0, w, h, null, 0, w);
        WritableImage out = new WritableImage(w, h);
        out.getPixelWriter().setPixels(0, 0, w, h, javafx.scene.image.PixelFormat.getIntArgbInstance(), argb, 0, w);
        return out;
    }

    /** @return a Java 2D copy (RGB) of a JavaFX picture */
    public static BufferedImage toAwt(Image image) {
        int w = (int) image.getWidth();
        int h = (int) image.getHeight();
        PixelReader reader = image.getPixelReader();
        int[] argb = new int[w * h];
        reader.getPixels(0, 0, w, h, javafx.scene.image.PixelFormat.getIntArgbInstance(), argb, 0, w);
        BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        out.setRGB(0, 0, w, h, argb, 0, w);
        return out;
    }

    /**
     * @param image the picture
     * @param file the PNG to create or replace (its folder must exist)
     * @throws IOException if it cannot be written; an earlier file is then kept
     */
    public static void writePng(Image image, Path file) throws IOException {
        BufferedImage awt = toAwt(image);
        AtomicFile.write(file, out -> {
            if (!ImageIO.write(awt, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
    }

    /** Fills a writer with ARGB pixels. */
    static void put(PixelWriter writer, int[] argb, int w, int h) {
        writer.setPixels(0, 0, w, h, javafx.scene.image.PixelFormat.getIntArgbInstance(), argb, 0, w);
    }
}
