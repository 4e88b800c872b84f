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
        long lo = Long.MAX_VALUE, hi = Long.MIN_VALUE, prev = 0;
        int rises = 0;
        for (int i = 0; i < n; i++) {
            long h = nextLong();
            if (i > 0 && h > prev) rises++;
            lo = Math.min(lo, h);
            hi = Math.max(hi, h);
            prev = h;
        }
        System.out.print(lo + "\n" + hi + "\n" + rises + "\n");
    }
}
