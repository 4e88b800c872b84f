import java.io.IOException;

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

    // Fixed nine decimals without String.format, which is slow for tens of thousands of lines.
    static void appendFixed9(StringBuilder out, double v) {
        long scaled = Math.round(Math.abs(v) * 1e9);
        if (v < 0 && scaled != 0) out.append('-');
        out.append(scaled / 1000000000).append('.');
        String frac = Long.toString(scaled % 1000000000);
        for (int i = frac.length(); i < 9; i++) out.append('0');
        out.append(frac).append('\n');
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long[] t = new long[n], h = new long[n];
        for (int i = 0; i < n; i++) {
            t[i] = nextLong();
            h[i] = nextLong();
        }
        int q = (int) nextLong();
        StringBuilder out = new StringBuilder();
        for (int k = 0; k < q; k++) {
            long x = nextLong();
            int lo = 0, hi = n - 1;  // last i with t[i] <= x
            while (lo < hi) {
                int mid = (lo + hi + 1) >>> 1;
                if (t[mid] <= x) lo = mid;
                else hi = mid - 1;
            }
            int i = lo;
            double height = i == n - 1 ? h[i] : h[i] + (double) (h[i + 1] - h[i]) * (x - t[i]) / (t[i + 1] - t[i]);
            appendFixed9(out, height);
        }
        System.out.print(out);
    }
}
