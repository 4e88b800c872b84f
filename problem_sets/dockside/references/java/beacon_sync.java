import java.util.Scanner;

public class Main {
    static long gcd(long a, long b) {
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        return a;
    }

    public static void main(String[] args) {
        Scanner in = new Scanner(System.in);
        int n = in.nextInt();
        long t = 1;
        for (int i = 0; i < n; i++) {
            long p = in.nextLong();
            t = t / gcd(t, p) * p;
        }
        System.out.println(t);
    }
}
