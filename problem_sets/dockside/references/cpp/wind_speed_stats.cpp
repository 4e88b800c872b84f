#include <cmath>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<double> x(n);
    double sum = 0;
    for (auto& v : x) {
        if (std::scanf("%lf", &v) != 1) return 1;
        sum += v;
    }
    double mean = sum / n, sq = 0;
    for (double v : x) sq += (v - mean) * (v - mean);
    std::printf("%.9f %.9f\n", mean, std::sqrt(sq / n));
}
