std::map<std::string, int64_t> factors;
int64_t rest = n;
for (int64_t divisor = 2; divisor * divisor <= rest; divisor += divisor == 2 ? 1 : 2) {
    while (rest % divisor == 0) {
        ++factors[std::to_string(divisor)];
        rest /= divisor;
    }
}
if (rest > 1) {
    ++factors[std::to_string(rest)];
}
return factors;
}
