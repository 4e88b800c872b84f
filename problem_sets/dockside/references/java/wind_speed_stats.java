import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.util.Locale;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        StringBuilder all = new StringBuilder();
        for (String line = in.readLine(); line != null; line = in.readLine()) all.append(line).append(' ');
        String[] tok = all.toString().trim().split("\\s+");
        int n = Integer.parseInt(tok[0]);
        double[] x = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            x[i] = Double.parseDouble(tok[1 + i]);
            sum += x[i];
        }
        double mean = sum / n, sq = 0;
        for (double v : x) sq += (v - mean) * (v - mean);
        System.out.printf(Locale.ROOT, "%.9f %.9f%n", mean, Math.sqrt(sq / n));
    }
}
