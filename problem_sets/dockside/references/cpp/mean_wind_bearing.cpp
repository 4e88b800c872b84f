#include <cmath>
#include <cstdio>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    const double pi = std::acos(-1.0);
    double east = 0, north = 0;
    for (int i = 0; i < n; ++i) {
        int b;
        if (std::scanf("%d", &b) != 1) return 1;
        east += std::sin(b * pi / 180);
        north += std::cos(b * pi / 180);
    }
    if (std::hypot(east, north) < 1e-6) {
        std::printf("VARIABLE\n");
        return 0;
    }
    double bearing = std::atan2(east, north) * 180 / pi;
    if (bearing < 0) bearing += 360;
    std::printf("%.9f\n", bearing);
}
