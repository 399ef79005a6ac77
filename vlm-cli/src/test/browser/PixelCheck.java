import java.awt.image.BufferedImage;
import java.io.File;

import javax.imageio.ImageIO;

/**
 * Fails (exit 1) when a screenshot is blank: too little variation in luminance or almost no ink.
 * Usage: java PixelCheck.java FILE.png [FILE.png ...]
 */
public final class PixelCheck {

    public static void main(String[] args) throws Exception {
        int bad = 0;
        for (String name : args) {
            BufferedImage img = ImageIO.read(new File(name));
            if (img == null) {
                System.out.println("FAIL " + name + ": not an image");
                bad++;
                continue;
            }
            long n = 0;
            double sum = 0;
            double sumSq = 0;
            long ink = 0;
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    int rgb = img.getRGB(x, y);
                    double l = 0.2126 * ((rgb >> 16) & 255) + 0.7152 * ((rgb >> 8) & 255) + 0.0722 * (rgb & 255);
                    sum += l;
                    sumSq += l * l;
                    n++;
                    if (l < 200) {
                        ink++;
                    }
                }
            }
            double mean = sum / n;
            double sd = Math.sqrt(Math.max(0, sumSq / n - mean * mean));
            double inkFraction = (double) ink / n;
            boolean ok = sd > 8 && inkFraction > 0.01;
            System.out.printf("%s %s: %dx%d, luminance sd %.1f, ink %.1f %%%n", ok ? "ok  " : "FAIL", name,
                    img.getWidth(), img.getHeight(), sd, 100 * inkFraction);
            if (!ok) {
                bad++;
            }
        }
        System.exit(bad == 0 ? 0 : 1);
    }
}
