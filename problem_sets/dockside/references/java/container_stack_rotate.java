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
        int r = nextInt(), c = nextInt();
        int[][] g = new int[r][c];
        for (int i = 0; i < r; i++)
            for (int j = 0; j < c; j++) g[i][j] = nextInt();
        StringBuilder out = new StringBuilder();
        for (int j = 0; j < c; j++) {
            for (int i = r - 1; i >= 0; i--) out.append(g[i][j]).append(i > 0 ? ' ' : '\n');
        }
        System.out.print(out);
    }
}
