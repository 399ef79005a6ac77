package org.spanlift.cli.plot;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;

import java.util.Iterator;

import javax.imageio.ImageIO;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;

/**
 * Paints a {@link Figure} into a bitmap and encodes it as PNG with the JDK's encoder (no time stamp, so the
 * same figure gives the same bytes). Drawn at twice the figure's size, sharp enough for print.
 */
public final class PngWriter {

    /** Device pixels per figure pixel. */
    public static final int SCALE = 2;

    private PngWriter() {
    }

    public static BufferedImage image(Figure figure) {
        BufferedImage image = new BufferedImage(figure.width() * SCALE, figure.height() * SCALE,
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g.scale(SCALE, SCALE);
            figure.paint(g);
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * The PNG file's bytes, encoded in memory: the image library's default would buffer through a
     * temporary file in the system's temporary folder, which may be missing, full or shared.
     */
    public static byte[] bytes(Figure figure) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
        if (!writers.hasNext()) {
            throw new IllegalStateException("no PNG encoder in this Java runtime");
        }
        ImageWriter writer = writers.next();
        try (ImageOutputStream stream = new MemoryCacheImageOutputStream(out)) {
            writer.setOutput(stream);
            writer.write(image(figure));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            writer.dispose();
        }
        return out.toByteArray();
    }
}
