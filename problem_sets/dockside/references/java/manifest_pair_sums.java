import java.io.IOException;
import java.util.HashMap;

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
        long target = nextLong();
        HashMap<Long, Long> seen = new HashMap<>(4 * n);
        long pairs = 0;
        for (int i = 0; i < n; i++) {
            long w = nextLong();
            pairs += seen.getOrDefault(target - w, 0L);  // earlier crates that complete this one
            seen.merge(w, 1L, Long::sum);
        }
        System.out.println(pairs);
    }
}
