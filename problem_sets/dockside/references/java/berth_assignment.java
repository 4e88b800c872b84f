import java.io.IOException;
import java.util.Arrays;
import java.util.PriorityQueue;

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
        long[] arrive = new long[n], leave = new long[n];
        long[] order = new long[n];  // arrival * 2^17 + index, sorted: ships by arrival
        for (int i = 0; i < n; i++) {
            arrive[i] = nextLong();
            leave[i] = nextLong();
            order[i] = (arrive[i] << 17) | i;
        }
        Arrays.sort(order);
        // (time the berth frees, berth number), earliest first
        PriorityQueue<long[]> inUse = new PriorityQueue<>((x, y) -> Long.compare(x[0], y[0]));
        int[] berth = new int[n];
        int count = 0;
        for (long key : order) {
            int i = (int) (key & ((1 << 17) - 1));
            int b;
            if (!inUse.isEmpty() && inUse.peek()[0] <= arrive[i]) b = (int) inUse.poll()[1];
            else b = ++count;
            berth[i] = b;
            inUse.add(new long[] {leave[i], b});
        }
        StringBuilder out = new StringBuilder().append(count).append('\n');
        for (int i = 0; i < n; i++) out.append(berth[i]).append(i + 1 < n ? ' ' : '\n');
        System.out.print(out);
    }
}
