const int64_t step = ((shift % 26) + 26) % 26;
std::string out = text;
for (char& ch : out) {
    if (ch >= 'a' && ch <= 'z') {
        ch = static_cast<char>('a' + (ch - 'a' + step) % 26);
    } else if (ch >= 'A' && ch <= 'Z') {
        ch = static_cast<char>('A' + (ch - 'A' + step) % 26);
    }
}
return out;
}
