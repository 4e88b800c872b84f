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

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long[] tails = new long[n];  // tails[k]: smallest last height of a rising selection of k + 1 trees
        int len = 0;
        for (int i = 0; i < n; i++) {
            long h = nextLong();
            int lo = 0, hi = len;  // first position whose tail is >= h
            while (lo < hi) {
                int mid = (lo + hi) >>> 1;
                if (tails[mid] < h) lo = mid + 1;
                else hi = mid;
            }
            tails[lo] = h;
            if (lo == len) len++;
        }
        System.out.println(len);
    }
}
