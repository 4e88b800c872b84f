uint64_t magnitude = n < 0 ? 0 - static_cast<uint64_t>(n) : static_cast<uint64_t>(n);
int64_t total = 0;
while (magnitude > 0) {
    total += static_cast<int64_t>(magnitude % 10);
    magnitude /= 10;
}
return total;
}
