package org.sectio.viewer.render;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;

/**
 * Lines of force of a sampled transverse field, for drawing: from seeds on a lattice over the section,
 * each line is followed both ways along the field direction by midpoint steps and stops at the wall,
 * where the field fades (below 2 % of its peak), where it comes back to its start (closed H lines), or
 * where it runs into a cell another line already passes through, so the lines are spread over the
 * guide instead of bunching.
 */
final class FieldLines {

    private static final int SEEDS_ACROSS = 16;
    private static final int STEPS_PER_SEED = 5;
    private static final int MAX_STEPS = 900;
    private static final double WEAK = 0.02;

    private FieldLines() {
    }

    static List<double[]> trace(CrossSection section, PatternSampler sampler, double[] vx, double[] vy) {
        Bounds b = section.bounds();
        double spacing = Math.max(b.width(), b.height()) / SEEDS_ACROSS;
        double step = spacing / STEPS_PER_SEED;
        double cell = spacing / 2;
        int cols = (int) Math.ceil(b.width() / cell) + 1;
        int rows = (int) Math.ceil(b.height() / cell) + 1;
        int[] owner = new int[cols * rows];
        List<double[]> lines = new ArrayList<>();
        int id = 0;
        for (double y = b.minY() + spacing / 2; y < b.maxY(); y += spacing) {
            for (double x = b.minX() + spacing / 2; x < b.maxX(); x += spacing) {
                int c = cellOf(b, cell, cols, rows, x, y);
                if (!section.contains(x, y) || owner[c] != 0) {
                    continue;
                }
                id++;
                List<double[]> back = follow(section, sampler, vx, vy, x, y, -step, owner, id, b, cell, cols, rows);
                List<double[]> ahead = follow(section, sampler, vx, vy, x, y, step, owner, id, b, cell, cols, rows);
                if (back.size() + ahead.size() < 3) {
                    continue;
                }
                double[] line = new double[2 * (back.size() + ahead.size() + 1)];
                int k = 0;
                for (int s = back.size() - 1; s >= 0; s--) {
                    line[k++] = back.get(s)[0];
                    line[k++] = back.get(s)[1];
                }
                line[k++] = x;
                line[k++] = y;
                for (double[] p : ahead) {
                    line[k++] = p[0];
                    line[k++] = p[1];
                }
                lines.add(line);
            }
        }
        return lines;
    }

    private static List<double[]> follow(CrossSection section, PatternSampler s, double[] vx, double[] vy, double x0,
                                         double y0, double h, int[] owner, int id, Bounds b, double cell, int cols,
                                         int rows) {
        List<double[]> points = new ArrayList<>();
        double x = x0;
        double y = y0;
        int lastCell = cellOf(b, cell, cols, rows, x, y);
        owner[lastCell] = id;
        for (int n = 0; n < MAX_STEPS; n++) {
            double[] d1 = direction(s, vx, vy, x, y);
            if (d1 == null) {
                break;
            }
            double[] d2 = direction(s, vx, vy, x + 0.5 * h * d1[0], y + 0.5 * h * d1[1]);
            if (d2 == null) {
                break;
            }
            double nx = x + h * d2[0];
            double ny = y + h * d2[1];
            if (!section.contains(nx, ny)) {
                break;
            }
            int c = cellOf(b, cell, cols, rows, nx, ny);
            if (c != lastCell && owner[c] != 0 && owner[c] != id) {
                break;
            }
            owner[c] = id;
            lastCell = c;
            x = nx;
            y = ny;
            points.add(new double[] {x, y});
            if (n > 2 * STEPS_PER_SEED && Math.hypot(x - x0, y - y0) < 0.6 * Math.abs(h)) {
                break; // closed line
            }
        }
        return points;
    }

    private static double[] direction(PatternSampler s, double[] vx, double[] vy, double x, double y) {
        double ax = s.sample(vx, x, y);
        double ay = s.sample(vy, x, y);
        double m = Math.hypot(ax, ay);
        return m > WEAK ? new double[] {ax / m, ay / m} : null;
    }

    private static int cellOf(Bounds b, double cell, int cols, int rows, double x, double y) {
        int i = Math.max(0, Math.min(cols - 1, (int) ((x - b.minX()) / cell)));
        int j = Math.max(0, Math.min(rows - 1, (int) ((y - b.minY()) / cell)));
        return j * cols + i;
    }
}
