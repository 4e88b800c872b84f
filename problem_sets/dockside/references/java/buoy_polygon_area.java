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
        int n = (int) nextLong();
        long[] x = new long[n], y = new long[n];
        for (int i = 0; i < n; i++) {
            x[i] = nextLong();
            y[i] = nextLong();
        }
        long twice = 0;  // shoelace formula: twice the signed area, in exact integers
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            twice += x[i] * y[j] - x[j] * y[i];
        }
        twice = Math.abs(twice);
        System.out.println(twice % 2 == 1 ? (twice / 2) + ".5" : Long.toString(twice / 2));
    }
}
