import javax.imageio.ImageIO;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.GeneralPath;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;
import java.awt.image.BufferedImage;
import java.io.File;

/**
 * Draws the app icon: a cooling coil's serpentine tube with a drop of water leaving it, on a
 * rounded tile. Run with {@code java src/packaging/icons/DrawIcon.java SIZE OUT.png}; the
 * committed PNG is its output at 256 px, so the icon can be changed here and redrawn.
 */
public final class DrawIcon {
    public static void main(String[] args) throws Exception {
        int size = Integer.parseInt(args[0]);
        BufferedImage img = new BufferedImage(size, size, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.scale(size / 256.0, size / 256.0);

        // tile: deep teal, lighter at the top
        g.setPaint(new GradientPaint(0, 0, new Color(0x1f6f78), 0, 256, new Color(0x123c4a)));
        g.fill(new RoundRectangle2D.Double(8, 8, 240, 240, 56, 56));

        // the coil: a serpentine tube across the lower half, with fins behind it
        g.setColor(new Color(255, 255, 255, 60));
        g.setStroke(new BasicStroke(3f));
        for (int x = 44; x <= 212; x += 12) {
            g.drawLine(x, 132, x, 216);
        }
        Path2D tube = new Path2D.Double();
        tube.moveTo(40, 144);
        tube.lineTo(196, 144);
        tube.curveTo(222, 144, 222, 174, 196, 174);
        tube.lineTo(60, 174);
        tube.curveTo(34, 174, 34, 204, 60, 204);
        tube.lineTo(216, 204);
        g.setColor(new Color(0xe8f1f2));
        g.setStroke(new BasicStroke(11f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(tube);

        // the drop: moisture taken out of the air
        GeneralPath drop = new GeneralPath();
        drop.moveTo(128, 26);
        drop.curveTo(146, 56, 170, 78, 170, 100);
        drop.curveTo(170, 124, 151, 138, 128, 138);
        drop.curveTo(105, 138, 86, 124, 86, 100);
        drop.curveTo(86, 78, 110, 56, 128, 26);
        drop.closePath();
        g.setPaint(new GradientPaint(100, 40, new Color(0x9fe0ff), 150, 138, new Color(0x2b9be0)));
        g.fill(drop);
        g.setColor(new Color(255, 255, 255, 170));
        g.setStroke(new BasicStroke(6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        Path2D glint = new Path2D.Double();
        glint.moveTo(106, 96);
        glint.curveTo(106, 110, 112, 118, 120, 121);
        g.draw(glint);

        g.dispose();
        ImageIO.write(img, "png", new File(args[1]));
    }
}
