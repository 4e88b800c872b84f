import java.io.IOException;
import java.util.Locale;

public class Main {
    public static void main(String[] args) throws IOException {
        String[] tok = new String(System.in.readAllBytes()).trim().split("\\s+");
        int n = Integer.parseInt(tok[0]);
        double east = 0, north = 0;
        for (int i = 1; i <= n; i++) {
            double b = Math.toRadians(Integer.parseInt(tok[i]));
            east += Math.sin(b);
            north += Math.cos(b);
        }
        if (Math.hypot(east, north) < 1e-6) {
            System.out.println("VARIABLE");
            return;
        }
        double bearing = Math.toDegrees(Math.atan2(east, north));
        if (bearing < 0) bearing += 360;
        System.out.printf(Locale.ROOT, "%.9f%n", bearing);
    }
}
