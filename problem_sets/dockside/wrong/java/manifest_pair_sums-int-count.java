import java.io.IOException;
import java.util.HashMap;

// Wrong on purpose: counts pairs in an int. With 200000 crates of equal weight there are
// 19999900000 pairs, which wraps around.
public class Main {
    public static void main(String[] args) throws IOException {
        String[] tok = new String(System.in.readAllBytes()).trim().split("\\s+");
        int n = Integer.parseInt(tok[0]);
        long target = Long.parseLong(tok[1]);
        HashMap<Long, Integer> seen = new HashMap<>();
        int pairs = 0;
        for (int i = 0; i < n; i++) {
            long w = Long.parseLong(tok[2 + i]);
            pairs += seen.getOrDefault(target - w, 0);
            seen.merge(w, 1, Integer::sum);
        }
        System.out.println(pairs);
    }
}
