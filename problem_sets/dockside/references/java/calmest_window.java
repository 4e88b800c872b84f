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

    public static void main(String[] args) throws IOException {
        buf = System.in.readAllBytes();
        int n = (int) nextLong(), k = (int) nextLong();
        long[] h = new long[n];
        for (int i = 0; i < n; i++) h[i] = nextLong();
        int[] window = new int[n];  // a deque of indices, heights decreasing; window[head] = maximum
        int head = 0, tail = 0;
        long best = -1;
        int start = 0;
        for (int i = 0; i < n; i++) {
            while (tail > head && h[window[tail - 1]] <= h[i]) tail--;
            window[tail++] = i;
            if (window[head] <= i - k) head++;
            if (i >= k - 1 && (best < 0 || h[window[head]] < best)) {
                best = h[window[head]];
                start = i - k + 2;
            }
        }
        System.out.println(best + " " + start);
    }
}
