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
        long[] w = new long[n];
        for (int i = 0; i < n; i++) w[i] = nextLong();
        long[] sorted = w.clone();
        Arrays.sort(sorted);
        int size = 0;
        for (int i = 0; i < n; i++)
            if (i == 0 || sorted[i] != sorted[i - 1]) sorted[size++] = sorted[i];
        int[] tree = new int[size + 1];  // Fenwick tree of counts by weight rank
        long swaps = 0;
        for (int seen = 0; seen < n; seen++) {
            int r = Arrays.binarySearch(sorted, 0, size, w[seen]) + 1;
            long notHeavier = 0;
            for (int i = r; i > 0; i &= i - 1) notHeavier += tree[i];
            swaps += seen - notHeavier;  // earlier crates heavier than this one
            for (int i = r; i <= size; i += i & -i) tree[i]++;
        }
        System.out.println(swaps);
    }
}
