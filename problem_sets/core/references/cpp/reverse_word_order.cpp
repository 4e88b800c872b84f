std::vector<std::string> words;
std::string word;
for (char ch : line) {
    if (ch == ' ') {
        if (!word.empty()) {
            words.push_back(word);
        }
        word.clear();
    } else {
        word += ch;
    }
}
if (!word.empty()) {
    words.push_back(word);
}
std::string out;
for (auto it = words.rbegin(); it != words.rend(); ++it) {
    if (!out.empty()) {
        out += ' ';
    }
    out += *it;
}
return out;
}
