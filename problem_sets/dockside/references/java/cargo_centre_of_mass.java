import java.io.IOException;
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

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long sx = 0, sy = 0, total = 0;
        for (int i = 0; i < n; i++) {
            long x = nextLong(), y = nextLong(), w = nextLong();
            sx += w * x;
            sy += w * y;
            total += w;
        }
        System.out.printf(Locale.ROOT, "%.9f %.9f%n", (double) sx / total, (double) sy / total);
    }
}
