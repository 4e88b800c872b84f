import java.io.IOException;
import java.util.Arrays;

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
        long[] a = new long[n], b = new long[n];
        for (int i = 0; i < n; i++) {
            a[i] = nextLong();
            b[i] = nextLong();
        }
        Arrays.sort(a);
        Arrays.sort(b);
        long best = 0, when = 0, current = 0;
        int j = 0;
        for (long t : a) {
            while (b[j] <= t) {  // a departure at t frees its mooring first
                current--;
                j++;
            }
            current++;
            if (current > best) {
                best = current;
                when = t;
            }
        }
        System.out.println(best + " " + when);
    }
}
