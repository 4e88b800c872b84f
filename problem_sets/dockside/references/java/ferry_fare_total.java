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
        int t = (int) nextLong();
        StringBuilder out = new StringBuilder();
        for (int k = 0; k < t; k++) {
            long a = nextLong(), c = nextLong(), s = nextLong(), b = nextLong();
            long pence = 450 * a + 225 * c + 310 * s + 105 * b;
            if (a + c + s >= 10) pence = (pence * 9 + 5) / 10;
            out.append(pence / 100).append('.');
            long p = pence % 100;
            if (p < 10) out.append('0');
            out.append(p).append('\n');
        }
        System.out.print(out);
    }
}
