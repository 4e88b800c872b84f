import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.util.HashMap;
import java.util.Map;
import java.util.StringTokenizer;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        int n = Integer.parseInt(in.readLine().trim());
        HashMap<String, long[]> totals = new HashMap<>();
        for (int i = 0; i < n; i++) {
            StringTokenizer tok = new StringTokenizer(in.readLine());
            String name = tok.nextToken();
            long kg = Long.parseLong(tok.nextToken());
            long[] entry = totals.computeIfAbsent(name, k -> new long[2]);
            entry[0] += kg;
            entry[1]++;
        }
        StringBuilder out = new StringBuilder();
        for (Map.Entry<String, long[]> e : totals.entrySet())
            out.append(e.getKey()).append(' ').append(e.getValue()[0]).append(' ').append(e.getValue()[1]).append('\n');
        System.out.print(out);
    }
}
