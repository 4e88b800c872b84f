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

    static long tripsNeeded(long[] weights, long capacity, long giveUp) {
        long trips = 1, load = 0;
        for (long w : weights) {
            if (load + w > capacity) {
                if (++trips > giveUp) break;
                load = 0;
            }
            load += w;
        }
        return trips;
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong();
        long d = nextLong();
        long[] weights = new long[n];
        long low = 0, high = 0;  // the answer lies in [max weight, total weight]
        for (int i = 0; i < n; i++) {
            weights[i] = nextLong();
            low = Math.max(low, weights[i]);
            high += weights[i];
        }
        while (low < high) {
            long mid = low + (high - low) / 2;
            if (tripsNeeded(weights, mid, d) <= d) high = mid;
            else low = mid + 1;
        }
        System.out.println(low);
    }
}
