package org.cohesa.desktop.space;

import java.util.Arrays;

/**
 * A small software rasteriser for the 3D view: discs, rings, a diamond and lines with smoothed edges, drawn
 * straight into an ARGB pixel array that the screen shows as one image.
 *
 * <p>Why: a JavaFX canvas turns every oval and line into its own draw call, and a software OpenGL (Mesa llvmpipe,
 * no GPU) pays a fixed cost per call, so 1,000 points drew at about 3 fps; writing the pixels here and handing the
 * renderer one image a frame costs a few milliseconds (docs/performance.md). Edge smoothing by pixel coverage
 * (distance from the shape's edge, clamped to one pixel) is common practice, no source.
 */
final class PixelRaster {

    final int width;
    final int height;
    final int[] pixels;

    PixelRaster(int width, int height) {
        this.width = Math.max(1, width);
        this.height = Math.max(1, height);
        this.pixels = new int[this.width * this.height];
    }

    void clear(int rgb) {
        Arrays.fill(pixels, 0xFF000000 | rgb);
    }

    int rgbAt(int x, int y) {
        return pixels[y * width + x] & 0xFFFFFF;
    }

    /** Lays {@code rgb} over the pixel with coverage {@code a} (0..1); opaque at 1, so a colour never mixes inside a shape. */
    private void put(int x, int y, int rgb, double a) {
        if (x < 0 || y < 0 || x >= width || y >= height || a <= 0) {
            return;
        }
        int i = y * width + x;
        if (a >= 1) {
            pixels[i] = 0xFF000000 | rgb;
            return;
        }
        int d = pixels[i];
        double b = 1 - a;
        int r = (int) (((rgb >> 16) & 255) * a + ((d >> 16) & 255) * b + 0.5);
        int g = (int) (((rgb >> 8) & 255) * a + ((d >> 8) & 255) * b + 0.5);
        int bl = (int) ((rgb & 255) * a + (d & 255) * b + 0.5);
        pixels[i] = 0xFF000000 | (r << 16) | (g << 8) | bl;
    }

    /** A filled disc of radius r with a rim of {@code rimWidth} pixels in another colour (0: no rim). */
    void disc(double cx, double cy, double r, int fill, int rim, double rimWidth) {
        int x0 = (int) Math.floor(cx - r - 1);
        int x1 = (int) Math.ceil(cx + r + 1);
        int y0 = (int) Math.floor(cy - r - 1);
        int y1 = (int) Math.ceil(cy + r + 1);
        double inner = r - rimWidth;
        for (int y = Math.max(0, y0); y <= Math.min(height - 1, y1); y++) {
            double dy = y + 0.5 - cy;
            for (int x = Math.max(0, x0); x <= Math.min(width - 1, x1); x++) {
                double dx = x + 0.5 - cx;
                double d = Math.sqrt(dx * dx + dy * dy);
                double cover = r + 0.5 - d;
                if (cover <= 0) {
                    continue;
                }
                put(x, y, rimWidth > 0 && d > inner ? rim : fill, Math.min(1, cover));
            }
        }
    }

    /** A circle outline of radius R and line width w. */
    void ring(double cx, double cy, double radius, double w, int rgb) {
        double half = w / 2;
        int x0 = (int) Math.floor(cx - radius - half - 1);
        int x1 = (int) Math.ceil(cx + radius + half + 1);
        int y0 = (int) Math.floor(cy - radius - half - 1);
        int y1 = (int) Math.ceil(cy + radius + half + 1);
        for (int y = Math.max(0, y0); y <= Math.min(height - 1, y1); y++) {
            double dy = y + 0.5 - cy;
            for (int x = Math.max(0, x0); x <= Math.min(width - 1, x1); x++) {
                double dx = x + 0.5 - cx;
                double cover = half + 0.5 - Math.abs(Math.sqrt(dx * dx + dy * dy) - radius);
                if (cover > 0) {
                    put(x, y, rgb, Math.min(1, cover));
                }
            }
        }
    }

    /** A filled diamond (a square on its corner) of half-diagonal h, with a dark rim. */
    void diamond(double cx, double cy, double h, int fill, int rim) {
        for (int y = Math.max(0, (int) Math.floor(cy - h - 1)); y <= Math.min(height - 1, (int) Math.ceil(cy + h + 1)); y++) {
            for (int x = Math.max(0, (int) Math.floor(cx - h - 1)); x <= Math.min(width - 1, (int) Math.ceil(cx + h + 1)); x++) {
                // distance to the edge of |dx| + |dy| ≤ h, measured perpendicular to the edge
                double d = (Math.abs(x + 0.5 - cx) + Math.abs(y + 0.5 - cy) - h) / Math.sqrt(2);
                double cover = 0.5 - d;
                if (cover > 0) {
                    put(x, y, d > -1.2 ? rim : fill, Math.min(1, cover));
                }
            }
        }
    }

    /**
     * A line of width w between two points; dashed when {@code dash} &gt; 0 (dash and gap in pixels). Walks the line's
     * longer screen direction one pixel at a time and covers the few pixels across it, so the cost grows with the
     * length, not with the area the line spans.
     */
    void line(double xa, double ya, double xb, double yb, double w, int rgb, double dash, double gap) {
        double dx = xb - xa;
        double dy = yb - ya;
        double len = Math.sqrt(dx * dx + dy * dy);
        if (len < 1e-9 || !Double.isFinite(len)) {
            return;
        }
        double half = w / 2;
        boolean steep = Math.abs(dy) > Math.abs(dx);
        double ux = dx / len;
        double uy = dy / len;
        if (!steep) {
            int from = (int) Math.floor(Math.min(xa, xb));
            int to = (int) Math.ceil(Math.max(xa, xb));
            double span = (half + 1) * len / Math.abs(dx);
            for (int x = Math.max(0, from); x <= Math.min(width - 1, to); x++) {
                double yc = ya + (x + 0.5 - xa) * dy / dx;
                for (int y = (int) Math.floor(yc - span); y <= (int) Math.ceil(yc + span); y++) {
                    cover(x, y, xa, ya, ux, uy, len, half, rgb, dash, gap);
                }
            }
        } else {
            int from = (int) Math.floor(Math.min(ya, yb));
            int to = (int) Math.ceil(Math.max(ya, yb));
            double span = (half + 1) * len / Math.abs(dy);
            for (int y = Math.max(0, from); y <= Math.min(height - 1, to); y++) {
                double xc = xa + (y + 0.5 - ya) * dx / dy;
                for (int x = (int) Math.floor(xc - span); x <= (int) Math.ceil(xc + span); x++) {
                    cover(x, y, xa, ya, ux, uy, len, half, rgb, dash, gap);
                }
            }
        }
    }

    private void cover(int x, int y, double xa, double ya, double ux, double uy, double len, double half, int rgb, double dash, double gap) {
        double px = x + 0.5 - xa;
        double py = y + 0.5 - ya;
        double along = px * ux + py * uy;
        if (along < -0.5 || along > len + 0.5) {
            return;
        }
        if (dash > 0 && (along % (dash + gap)) > dash) {
            return;
        }
        double across = Math.abs(px * uy - py * ux);
        double c = Math.min(1, half + 0.5 - across);
        if (c > 0) {
            put(x, y, rgb, c);
        }
    }

    static int rgb(javafx.scene.paint.Color c) {
        return ((int) Math.round(c.getRed() * 255) << 16) | ((int) Math.round(c.getGreen() * 255) << 8) | (int) Math.round(c.getBlue() * 255);
    }
}
