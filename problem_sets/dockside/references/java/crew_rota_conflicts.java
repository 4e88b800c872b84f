import java.io.IOException;

public class Main {
    public static void main(String[] args) throws IOException {
        String[] tok = new String(System.in.readAllBytes()).trim().split("\\s+");
        int n = Integer.parseInt(tok[0]);
        String[] name = new String[n];
        int[] s = new int[n], e = new int[n];
        for (int i = 0; i < n; i++) {
            name[i] = tok[1 + 3 * i];
            s[i] = Integer.parseInt(tok[2 + 3 * i]);
            e[i] = Integer.parseInt(tok[3 + 3 * i]);
        }
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
                if (Math.max(s[i], s[j]) < Math.min(e[i], e[j])) {
                    boolean iFirst = name[i].compareTo(name[j]) < 0;  // ASCII order for these names
                    out.append(iFirst ? name[i] : name[j]).append(' ').append(iFirst ? name[j] : name[i]).append('\n');
                }
        System.out.print(out.length() == 0 ? "NONE\n" : out.toString());
    }
}
