import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.util.Map;
import java.util.StringTokenizer;
import java.util.TreeMap;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        int q = Integer.parseInt(in.readLine().trim());
        TreeMap<String, Long> stock = new TreeMap<>();  // String order is ASCII order for these names
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < q; i++) {
            StringTokenizer tok = new StringTokenizer(in.readLine());
            String command = tok.nextToken(), item = tok.nextToken();
            long have = stock.getOrDefault(item, 0L);
            if (command.equals("IN")) {
                stock.put(item, have + Long.parseLong(tok.nextToken()));
            } else if (command.equals("OUT")) {
                long k = Long.parseLong(tok.nextToken());
                if (have >= k) stock.put(item, have - k);
                else out.append("SHORT ").append(item).append(' ').append(have).append('\n');
            } else {
                out.append(item).append(' ').append(have).append('\n');
            }
        }
        out.append("END\n");
        for (Map.Entry<String, Long> e : stock.entrySet())
            if (e.getValue() > 0) out.append(e.getKey()).append(' ').append(e.getValue()).append('\n');
        System.out.print(out);
    }
}
