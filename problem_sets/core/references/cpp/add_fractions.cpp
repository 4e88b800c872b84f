int64_t numerator = 0;
int64_t denominator = 1;
for (const auto& [p, q] : fracs) {
    numerator = numerator * q + p * denominator;
    denominator *= q;
    if (denominator < 0) {
        numerator = -numerator;
        denominator = -denominator;
    }
    const int64_t common = std::gcd(numerator, denominator);
    numerator /= common;
    denominator /= common;
}
return {numerator, denominator};
}
