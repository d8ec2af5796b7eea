package org.cohesa.desktop.space;

import java.util.List;
import javafx.geometry.Point3D;
import javafx.scene.shape.TriangleMesh;
import javafx.scene.shape.VertexFormat;

/**
 * Many small round markers merged into one triangle mesh: every point is an icosahedron (12 vertices,
 * 20 faces) with outward normals, so 1,000 points cost one scene-graph node and one draw call per colour
 * instead of 1,000 nodes. The point under the mouse is found from the picked face: face / 20.
 */
public final class PointMesh {

    public static final int FACES_PER_POINT = 20;

    private static final double T = (1 + Math.sqrt(5)) / 2;
    private static final double[][] VERTICES = {
        {-1, T, 0}, {1, T, 0}, {-1, -T, 0}, {1, -T, 0},
        {0, -1, T}, {0, 1, T}, {0, -1, -T}, {0, 1, -T},
        {T, 0, -1}, {T, 0, 1}, {-T, 0, -1}, {-T, 0, 1}};
    private static final int[][] FACES = {
        {0, 11, 5}, {0, 5, 1}, {0, 1, 7}, {0, 7, 10}, {0, 10, 11},
        {1, 5, 9}, {5, 11, 4}, {11, 10, 2}, {10, 7, 6}, {7, 1, 8},
        {3, 9, 4}, {3, 4, 2}, {3, 2, 6}, {3, 6, 8}, {3, 8, 9},
        {4, 9, 5}, {2, 4, 11}, {6, 2, 10}, {8, 6, 7}, {9, 8, 1}};

    private PointMesh() {
    }

    /** One mesh holding a marker of {@code radius} (world units) at each centre. */
    public static TriangleMesh of(List<Point3D> centres, double radius) {
        TriangleMesh mesh = new TriangleMesh(VertexFormat.POINT_NORMAL_TEXCOORD);
        int n = centres.size();
        float[] points = new float[n * 12 * 3];
        float[] normals = new float[n * 12 * 3];
        int[] faces = new int[n * FACES_PER_POINT * 9];
        double len = Math.sqrt(1 + T * T);
        for (int i = 0; i < n; i++) {
            Point3D c = centres.get(i);
            for (int v = 0; v < 12; v++) {
                int k = (i * 12 + v) * 3;
                double nx = VERTICES[v][0] / len;
                double ny = VERTICES[v][1] / len;
                double nz = VERTICES[v][2] / len;
                points[k] = (float) (c.getX() + nx * radius);
                points[k + 1] = (float) (c.getY() + ny * radius);
                points[k + 2] = (float) (c.getZ() + nz * radius);
                normals[k] = (float) nx;
                normals[k + 1] = (float) ny;
                normals[k + 2] = (float) nz;
            }
            for (int f = 0; f < FACES_PER_POINT; f++) {
                int k = (i * FACES_PER_POINT + f) * 9;
                for (int j = 0; j < 3; j++) {
                    int vi = i * 12 + FACES[f][j];
                    faces[k + j * 3] = vi;
                    faces[k + j * 3 + 1] = vi;
                    faces[k + j * 3 + 2] = 0;
                }
            }
        }
        mesh.getPoints().setAll(points);
        mesh.getNormals().setAll(normals);
        mesh.getTexCoords().setAll(0, 0);
        mesh.getFaces().setAll(faces);
        return mesh;
    }
}
