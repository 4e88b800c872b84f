import java.io.IOException;

public class Main {
    public static void main(String[] args) throws IOException {
        byte[] raw = System.in.readAllBytes();
        int n = 0;
        while (n < raw.length && raw[n] > ' ') n++;
        byte[] stack = new byte[n];
        int depth = 0;
        for (int i = 0; i < n; i++) {
            byte c = raw[i];
            byte opener = c == ')' ? (byte) '(' : c == ']' ? (byte) '[' : c == '}' ? (byte) '{' : c == '>' ? (byte) '<' : 0;
            if (opener == 0) {
                stack[depth++] = c;
            } else if (depth == 0 || stack[depth - 1] != opener) {
                System.out.println("INVALID " + (i + 1));
                return;
            } else {
                depth--;
            }
        }
        System.out.println(depth == 0 ? "VALID" : "INVALID " + (n + 1));
    }
}
