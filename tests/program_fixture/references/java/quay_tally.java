import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        int n = Integer.parseInt(in.readLine().trim());
        long total = 0, heaviest = 0;
        for (int i = 0; i < n; i++) {
            long w = Long.parseLong(in.readLine().trim());
            total += w;
            heaviest = Math.max(heaviest, w);
        }
        System.out.println(total + " " + heaviest);
    }
}
