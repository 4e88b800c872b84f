// Space, tab and newline are single bytes that never occur inside a multi-byte UTF-8 sequence.
std::string out;
bool pending = false;
for (char ch : text) {
    if (ch == ' ' || ch == '\t' || ch == '\n') {
        pending = true;
        continue;
    }
    if (pending && !out.empty()) {
        out += ' ';
    }
    pending = false;
    out += ch;
}
return out;
}
