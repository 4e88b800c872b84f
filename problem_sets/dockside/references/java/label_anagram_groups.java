import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;

public class Main {
    public static void main(String[] args) throws IOException {
        String[] tok = new String(System.in.readAllBytes()).trim().split("\\s+");
        int n = Integer.parseInt(tok[0]);
        HashMap<String, List<String>> groups = new HashMap<>();  // keyed by the sorted letters
        for (int i = 1; i <= n; i++) {
            char[] key = tok[i].toCharArray();
            Arrays.sort(key);
            groups.computeIfAbsent(new String(key), k -> new ArrayList<>()).add(tok[i]);
        }
        StringBuilder out = new StringBuilder();
        for (List<String> labels : groups.values()) {
            if (labels.size() < 2) continue;
            Collections.sort(labels);  // String order is ASCII order for these labels
            out.append(String.join(" ", labels)).append('\n');
        }
        System.out.print(out.length() == 0 ? "NONE\n" : out.toString());
    }
}
