uint64_t bits = static_cast<uint64_t>(mask);
int64_t count = 0;
while (bits != 0) {
    bits &= bits - 1;
    ++count;
}
return count;
}
