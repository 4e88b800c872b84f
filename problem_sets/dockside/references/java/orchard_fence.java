import java.io.IOException;
import java.util.Arrays;
import java.util.Locale;

public class Main {
    static byte[] buf;
    static int pos;

    static long nextLong() {
        while (buf[pos] <= ' ') pos++;
        boolean neg = buf[pos] == '-';
        if (neg) pos++;
        long r = 0;
        while (pos < buf.length && buf[pos] > ' ') r = r * 10 + (buf[pos++] - '0');
        return neg ? -r : r;
    }

    static long cross(long[] o, long[] a, long[] b) {
        return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long[][] pts = new long[n][];
        for (int i = 0; i < n; i++) pts[i] = new long[] {nextLong(), nextLong()};
        Arrays.sort(pts, (a, b) -> a[0] != b[0] ? Long.compare(a[0], b[0]) : Long.compare(a[1], b[1]));
        int m = 0;  // drop repeated points
        for (int i = 0; i < n; i++)
            if (m == 0 || pts[i][0] != pts[m - 1][0] || pts[i][1] != pts[m - 1][1]) pts[m++] = pts[i];
        if (m == 1) {
            System.out.println("0.000000000");
            return;
        }
        // Andrew's monotone chain: lower hull left to right, then upper hull right to left.
        long[][] hull = new long[2 * m][];
        int size = 0;
        for (int pass = 0; pass < 2; pass++) {
            int start = size;
            for (int k = 0; k < m; k++) {
                long[] p = pass == 0 ? pts[k] : pts[m - 1 - k];
                while (size >= start + 2 && cross(hull[size - 2], hull[size - 1], p) <= 0) size--;
                hull[size++] = p;
            }
            size--;  // the last point starts the other half
        }
        double length = 0;
        for (int i = 0; i < size; i++) {
            long[] a = hull[i], b = hull[(i + 1) % size];
            length += Math.hypot(a[0] - b[0], a[1] - b[1]);
        }
        System.out.printf(Locale.ROOT, "%.9f%n", length);
    }
}
