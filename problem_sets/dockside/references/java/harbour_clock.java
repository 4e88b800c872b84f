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
            String clock = tok.nextToken();
            long d = Long.parseLong(tok.nextToken());
            long end = Integer.parseInt(clock.substring(0, 2)) * 60 + Integer.parseInt(clock.substring(3, 5)) + d;
            long days = end / 1440, minute = end % 1440;
            out.append(String.format("%02d:%02d", minute / 60, minute % 60));
            if (days > 0) out.append(" +").append(days);
            out.append('\n');
        }
        System.out.print(out);
    }
}
