import java.io.IOException;

public class Main {
    static byte[] buf;
    static int pos;

    static int nextInt() {
        while (buf[pos] <= ' ') pos++;
        boolean neg = buf[pos] == '-';
        if (neg) pos++;
        int r = 0;
        while (pos < buf.length && buf[pos] > ' ') r = r * 10 + (buf[pos++] - '0');
        return neg ? -r : r;
    }

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = nextInt(), m = nextInt(), k = nextInt();
        int[] change = new int[n + 2];  // coats added at a segment minus coats ending just before it
        for (int j = 0; j < m; j++) {
            change[nextInt()]++;
            change[nextInt() + 1]--;
        }
        int coats = 0, count = 0;
        for (int s = 1; s <= n; s++) {
            coats += change[s];
            if (coats >= k) count++;
        }
        System.out.println(count);
    }
}
