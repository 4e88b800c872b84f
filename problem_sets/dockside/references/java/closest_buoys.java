import java.io.IOException;
import java.util.Arrays;
import java.util.Locale;

public class Main {
    static byte[] buf;
    static int pos;
    static long[] xs, ys, tx, ty;

    static long nextLong() {
        while (buf[pos] <= ' ') pos++;
        boolean neg = buf[pos] == '-';
        if (neg) pos++;
        long r = 0;
        while (pos < buf.length && buf[pos] > ' ') r = r * 10 + (buf[pos++] - '0');
        return neg ? -r : r;
    }

    // Smallest squared distance in [lo, hi) (sorted by x); leaves that range sorted by y.
    static long closest(int lo, int hi) {
        if (hi - lo <= 3) {
            long best = Long.MAX_VALUE;
            for (int i = lo; i < hi; i++)
                for (int j = i + 1; j < hi; j++) {
                    long dx = xs[i] - xs[j], dy = ys[i] - ys[j];
                    best = Math.min(best, dx * dx + dy * dy);
                }
            for (int i = lo + 1; i < hi; i++)  // insertion sort by y
                for (int j = i; j > lo && ys[j] < ys[j - 1]; j--) {
                    long t = xs[j]; xs[j] = xs[j - 1]; xs[j - 1] = t;
                    t = ys[j]; ys[j] = ys[j - 1]; ys[j - 1] = t;
                }
            return best;
        }
        int mid = (lo + hi) >>> 1;
        long splitX = xs[mid];
        long best = Math.min(closest(lo, mid), closest(mid, hi));
        int a = lo, b = mid, k = 0;
        while (a < mid || b < hi) {
            if (b >= hi || (a < mid && ys[a] <= ys[b])) { tx[k] = xs[a]; ty[k++] = ys[a++]; }
            else { tx[k] = xs[b]; ty[k++] = ys[b++]; }
        }
        System.arraycopy(tx, 0, xs, lo, k);
        System.arraycopy(ty, 0, ys, lo, k);
        int size = 0;
        for (int i = lo; i < hi; i++) {
            long dx = xs[i] - splitX;
            if (dx * dx < best) { tx[size] = xs[i]; ty[size++] = ys[i]; }
        }
        for (int i = 0; i < size; i++)
            for (int j = i + 1; j < size; j++) {
                long dy = ty[j] - ty[i];
                if (dy * dy >= best) break;
                long dx = tx[j] - tx[i];
                best = Math.min(best, dx * dx + dy * dy);
            }
        return best;
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long[][] p = new long[n][];
        for (int i = 0; i < n; i++) p[i] = new long[] {nextLong(), nextLong()};
        Arrays.sort(p, (u, v) -> Long.compare(u[0], v[0]));
        xs = new long[n]; ys = new long[n]; tx = new long[n]; ty = new long[n];
        for (int i = 0; i < n; i++) { xs[i] = p[i][0]; ys[i] = p[i][1]; }
        System.out.printf(Locale.ROOT, "%.9f%n", Math.sqrt((double) closest(0, n)));
    }
}
