uint64_t divisor = 0;
for (int64_t count : counts) {
    const uint64_t magnitude = count < 0 ? 0 - static_cast<uint64_t>(count) : static_cast<uint64_t>(count);
    divisor = std::gcd(divisor, magnitude);
}
return static_cast<int64_t>(divisor);
}
