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
        int n = (int) nextLong(), k = (int) nextLong();
        long[] w = new long[n];
        for (int i = 0; i < n; i++) w[i] = nextLong();
        Arrays.sort(w);
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < k; i++) out.append(w[n - 1 - i]).append(i + 1 < k ? ' ' : '\n');
        System.out.print(out);
    }
}
