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
        int n = nextInt(), m = nextInt();
        int[] ruleA = new int[m], ruleB = new int[m];
        int[] start = new int[n + 2];
        int[] waitingOn = new int[n + 1];  // rules still blocking each crate
        for (int i = 0; i < m; i++) {
            ruleA[i] = nextInt();
            ruleB[i] = nextInt();
            start[ruleA[i] + 1]++;
            waitingOn[ruleB[i]]++;
        }
        for (int c = 1; c <= n + 1; c++) start[c] += start[c - 1];
        int[] fill = start.clone();
        int[] after = new int[m];
        for (int i = 0; i < m; i++) after[fill[ruleA[i]]++] = ruleB[i];
        int[] order = new int[n];  // doubles as the queue of crates ready to go
        int size = 0;
        for (int c = 1; c <= n; c++)
            if (waitingOn[c] == 0) order[size++] = c;
        for (int head = 0; head < size; head++) {
            int c = order[head];
            for (int e = start[c]; e < start[c + 1]; e++)
                if (--waitingOn[after[e]] == 0) order[size++] = after[e];
        }
        if (size != n) {
            System.out.println("STUCK");
            return;
        }
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < n; i++) out.append(order[i]).append(i + 1 < n ? ' ' : '\n');
        System.out.print(out);
    }
}
