static const char digits[] = "0123456789abcdefghijklmnopqrstuvwxyz";
if (n == 0) {
    return "0";
}
// The magnitude as unsigned, so that the most negative value has one too.
uint64_t magnitude = n < 0 ? 0 - static_cast<uint64_t>(n) : static_cast<uint64_t>(n);
const uint64_t radix = static_cast<uint64_t>(base);
std::string out;
while (magnitude > 0) {
    out += digits[magnitude % radix];
    magnitude /= radix;
}
if (n < 0) {
    out += '-';
}
std::reverse(out.begin(), out.end());
return out;
}
