import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.util.StringTokenizer;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        StringBuilder all = new StringBuilder();
        for (String line = in.readLine(); line != null; line = in.readLine()) all.append(line).append('\n');
        StringTokenizer tok = new StringTokenizer(all.toString());
        int t = Integer.parseInt(tok.nextToken());
        StringBuilder out = new StringBuilder();
        for (int k = 0; k < t; k++) {
            String label = tok.nextToken();
            boolean digits = label.length() == 8;
            for (int i = 0; i < label.length(); i++) {
                char c = label.charAt(i);
                if (c < '0' || c > '9') digits = false;
            }
            if (!digits) {
                out.append("MALFORMED\n");
                continue;
            }
            int s = 0;
            for (int i = 0; i < 7; i++) s += (label.charAt(i) - '0') * (i % 2 == 0 ? 3 : 1);
            int d = (10 - s % 10) % 10;
            if (label.charAt(7) - '0' == d) out.append("OK\n");
            else out.append("BAD ").append(d).append('\n');
        }
        System.out.print(out);
    }
}
