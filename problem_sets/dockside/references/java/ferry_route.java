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
        int n = (int) nextLong(), m = (int) nextLong();
        int[] from = new int[m], to = new int[m];
        long[] time = new long[m];
        int[] degree = new int[n + 2];
        for (int i = 0; i < m; i++) {
            from[i] = (int) nextLong();
            to[i] = (int) nextLong();
            time[i] = nextLong();
            degree[from[i]]++;
            degree[to[i]]++;
        }
        int[] start = new int[n + 2];  // adjacency in compressed rows
        for (int v = 1; v <= n; v++) start[v + 1] = start[v] + degree[v];
        int[] fill = Arrays.copyOf(start, n + 2);
        int[] other = new int[2 * m];
        long[] weight = new long[2 * m];
        for (int i = 0; i < m; i++) {
            other[fill[from[i]]] = to[i];
            weight[fill[from[i]]++] = time[i];
            other[fill[to[i]]] = from[i];
            weight[fill[to[i]]++] = time[i];
        }
        long[] dist = new long[n + 1];
        Arrays.fill(dist, Long.MAX_VALUE);
        int[] cameFrom = new int[n + 1];
        dist[1] = 0;
        PriorityQueue<long[]> heap = new PriorityQueue<>((a, b) -> Long.compare(a[0], b[0]));
        heap.add(new long[] {0, 1});
        while (!heap.isEmpty()) {
            long[] top = heap.poll();
            int u = (int) top[1];
            if (top[0] > dist[u]) continue;
            if (u == n) break;
            for (int e = start[u]; e < start[u + 1]; e++) {
                int v = other[e];
                long nd = top[0] + weight[e];
                if (nd < dist[v]) {
                    dist[v] = nd;
                    cameFrom[v] = u;
                    heap.add(new long[] {nd, v});
                }
            }
        }
        if (dist[n] == Long.MAX_VALUE) {
            System.out.println(-1);
            return;
        }
        int[] route = new int[n];
        int len = 0;
        for (int v = n; v != 1; v = cameFrom[v]) route[len++] = v;
        route[len++] = 1;
        StringBuilder out = new StringBuilder().append(dist[n]).append('\n');
        for (int i = len - 1; i >= 0; i--) out.append(route[i]).append(i > 0 ? ' ' : '\n');
        System.out.print(out);
    }
}
