import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Area;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import javax.imageio.ImageIO;

/**
 * Draws the extension's icon, Miscela's own design: two drops, one teal and one amber, merging on a dark blue tile;
 * where they overlap the colours mix. 42 × 42 pixels, the size the Extension Manager shows. A second picture in
 * black and white is the high-contrast variant. Run by scripts/draw-icon; the PNGs are committed in packaging/.
 */
public final class DrawIcon {
    private static final int SIZE = 42;
    private static final int SCALE = 8; // drawn large, then reduced: smoother edges than drawing at 42 px

    private DrawIcon() {
    }

    /** A drop: a circle of radius r around (cx, cy) with a point at height h above the centre. */
    private static Shape drop(double cx, double cy, double r, double h) {
        double tangent = Math.asin(r / h); // half-angle of the point, from the tangent lines of the circle
        double tx = r * Math.cos(tangent);
        double ty = r * Math.sin(tangent);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(cx, cy - h);
        p.lineTo(cx + tx, cy - ty);
        p.lineTo(cx - tx, cy - ty);
        p.closePath();
        Area a = new Area(p);
        a.add(new Area(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r)));
        return a;
    }

    private static BufferedImage draw(boolean highContrast) {
        int big = SIZE * SCALE;
        BufferedImage img = new BufferedImage(big, big, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.scale(SCALE, SCALE);

        Shape tile = new RoundRectangle2D.Double(1, 1, 40, 40, 11, 11);
        if (highContrast) {
            g.setColor(Color.BLACK);
        } else {
            g.setPaint(new GradientPaint(0, 1, new Color(0x1F, 0x2E, 0x55), 0, 41, new Color(0x2F, 0x4B, 0x80)));
        }
        g.fill(tile);

        Shape left = drop(16.5, 25.5, 9.5, 19.0);
        Shape right = drop(25.5, 25.5, 9.5, 19.0);
        Area overlap = new Area(left);
        overlap.intersect(new Area(right));
        if (highContrast) {
            g.setColor(Color.WHITE);
            g.setStroke(new BasicStroke(1.6f));
            g.draw(left);
            g.draw(right);
            g.fill(overlap);
        } else {
            g.setColor(new Color(0x2F, 0xC4, 0xB2));
            g.fill(left);
            g.setColor(new Color(0xF2, 0xA2, 0x3A));
            g.fill(right);
            g.setColor(new Color(0x9C, 0xC9, 0x5A)); // teal and amber mixed
            g.fill(overlap);
            g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, 0.55f));
            g.setColor(Color.WHITE);
            g.fill(new Ellipse2D.Double(10.5, 22.0, 3.2, 4.6)); // a highlight on each drop
            g.fill(new Ellipse2D.Double(28.3, 22.0, 3.2, 4.6));
        }
        g.dispose();

        BufferedImage small = new BufferedImage(SIZE, SIZE, BufferedImage.TYPE_INT_ARGB);
        for (int y = 0; y < SIZE; y++) {
            for (int x = 0; x < SIZE; x++) {
                small.setRGB(x, y, average(img, x * SCALE, y * SCALE));
            }
        }
        return small;
    }

    /** The mean of a SCALE × SCALE block, with colours weighted by their alpha (no dark fringes). */
    private static int average(BufferedImage img, int x0, int y0) {
        double a = 0, r = 0, gr = 0, b = 0;
        for (int y = y0; y < y0 + SCALE; y++) {
            for (int x = x0; x < x0 + SCALE; x++) {
                int p = img.getRGB(x, y);
                double alpha = (p >>> 24) / 255.0;
                a += alpha;
                r += alpha * ((p >> 16) & 0xFF);
                gr += alpha * ((p >> 8) & 0xFF);
                b += alpha * (p & 0xFF);
            }
        }
        int n = SCALE * SCALE;
        if (a == 0) {
            return 0;
        }
        int alpha = (int) Math.round(255 * a / n);
        return alpha << 24 | (int) Math.round(r / a) << 16 | (int) Math.round(gr / a) << 8 | (int) Math.round(b / a);
    }

    public static void main(String[] args) throws IOException {
        File dir = new File(args.length > 0 ? args[0] : "packaging");
        ImageIO.write(draw(false), "png", new File(dir, "icon.png"));
        ImageIO.write(draw(true), "png", new File(dir, "icon-high-contrast.png"));
        System.out.println("wrote " + new File(dir, "icon.png") + " and " + new File(dir, "icon-high-contrast.png"));
    }
}
