import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.util.StringTokenizer;

public class Main {
    public static void main(String[] args) throws IOException {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in));
        StringTokenizer first = new StringTokenizer(in.readLine());
        int r = Integer.parseInt(first.nextToken()), c = Integer.parseInt(first.nextToken());
        char[][] grid = new char[r][];
        for (int i = 0; i < r; i++) grid[i] = in.readLine().trim().toCharArray();
        int[] steps = new int[r * c];
        java.util.Arrays.fill(steps, -1);
        int[] queue = new int[r * c];
        int head = 0, tail = 0;
        for (int i = 0; i < r; i++)
            for (int j = 0; j < c; j++)
                if (grid[i][j] == 'S') {
                    steps[i * c + j] = 0;
                    queue[tail++] = i * c + j;
                }
        int[] di = {-1, 1, 0, 0}, dj = {0, 0, -1, 1};
        while (head < tail) {
            int cell = queue[head++], i = cell / c, j = cell % c;
            if (grid[i][j] == 'T') {
                System.out.println(steps[cell]);
                return;
            }
            for (int d = 0; d < 4; d++) {
                int ni = i + di[d], nj = j + dj[d];
                if (ni >= 0 && ni < r && nj >= 0 && nj < c && grid[ni][nj] != '#' && steps[ni * c + nj] < 0) {
                    steps[ni * c + nj] = steps[cell] + 1;
                    queue[tail++] = ni * c + nj;
                }
            }
        }
        System.out.println(-1);
    }
}
