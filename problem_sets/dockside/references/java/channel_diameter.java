import java.io.IOException;
import java.util.Arrays;

public class Main {
    static byte[] buf;
    static int pos;
    static int n;
    static int[] start, other;
    static long[] length;

    static long nextLong() {
        while (buf[pos] <= ' ') pos++;
        boolean neg = buf[pos] == '-';
        if (neg) pos++;
        long r = 0;
        while (pos < buf.length && buf[pos] > ' ') r = r * 10 + (buf[pos++] - '0');
        return neg ? -r : r;
    }

    // Distances from source to every islet, by an explicit-stack walk.
    static long[] distances(int source) {
        long[] dist = new long[n + 1];
        Arrays.fill(dist, -1);
        int[] stack = new int[n];
        int top = 0;
        stack[top++] = source;
        dist[source] = 0;
        while (top > 0) {
            int u = stack[--top];
            for (int e = start[u]; e < start[u + 1]; e++)
                if (dist[other[e]] < 0) {
                    dist[other[e]] = dist[u] + length[e];
                    stack[top++] = other[e];
                }
        }
        return dist;
    }

    static int argmax(long[] dist) {
        int best = 1;
        for (int v = 2; v <= n; v++)
            if (dist[v] > dist[best]) best = v;
        return best;
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        n = (int) nextLong();
        int[] a = new int[n], b = new int[n];
        long[] c = new long[n];
        start = new int[n + 2];
        for (int i = 0; i < n - 1; i++) {
            a[i] = (int) nextLong();
            b[i] = (int) nextLong();
            c[i] = nextLong();
            start[a[i] + 1]++;
            start[b[i] + 1]++;
        }
        for (int v = 1; v <= n + 1; v++) start[v] += start[v - 1];
        int[] fill = start.clone();
        other = new int[2 * n];
        length = new long[2 * n];
        for (int i = 0; i < n - 1; i++) {
            other[fill[a[i]]] = b[i];
            length[fill[a[i]]++] = c[i];
            other[fill[b[i]]] = a[i];
            length[fill[b[i]]++] = c[i];
        }
        // The islet farthest from any islet is an end of a longest route.
        int end = argmax(distances(1));
        long[] dist = distances(end);
        System.out.println(dist[argmax(dist)]);
    }
}
