import java.io.IOException;

public class Main {
    static byte[] buf;
    static int pos;
    static int[] parent, size;

    static int nextInt() {
        while (buf[pos] <= ' ') pos++;
        boolean neg = buf[pos] == '-';
        if (neg) pos++;
        int r = 0;
        while (pos < buf.length && buf[pos] > ' ') r = r * 10 + (buf[pos++] - '0');
        return neg ? -r : r;
    }

    static int find(int x) {
        int root = x;
        while (parent[root] != root) root = parent[root];
        while (parent[x] != root) {  // path compression
            int next = parent[x];
            parent[x] = root;
            x = next;
        }
        return root;
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = nextInt(), m = nextInt();
        parent = new int[n + 1];
        size = new int[n + 1];
        for (int i = 0; i <= n; i++) {
            parent[i] = i;
            size[i] = 1;
        }
        int groups = n, joined = n == 1 ? 0 : -1, wasted = 0;
        for (int j = 1; j <= m; j++) {
            int a = find(nextInt()), b = find(nextInt());
            if (a == b) {
                wasted++;
                continue;
            }
            if (size[a] < size[b]) {
                int t = a;
                a = b;
                b = t;
            }
            parent[b] = a;
            size[a] += size[b];
            if (--groups == 1) joined = j;
        }
        System.out.println(joined + " " + wasted);
    }
}
