size_t pos = 0;
bool divided_by_zero = false;
auto skip_spaces = [&]() {
    while (pos < expr.size() && expr[pos] == ' ') {
        ++pos;
    }
};
auto peek = [&]() -> char {
    skip_spaces();
    return pos < expr.size() ? expr[pos] : '\0';
};
std::function<int64_t()> parse_sum;
std::function<int64_t()> parse_unary = [&]() -> int64_t {
    if (peek() == '-') {
        ++pos;
        return -parse_unary();
    }
    if (peek() == '(') {
        ++pos;
        const int64_t inner = parse_sum();
        peek();
        ++pos;  // the closing parenthesis
        return inner;
    }
    int64_t number = 0;
    while (pos < expr.size() && std::isdigit(static_cast<unsigned char>(expr[pos]))) {
        number = number * 10 + (expr[pos] - '0');
        ++pos;
    }
    return number;
};
auto parse_product = [&]() -> int64_t {
    int64_t value = parse_unary();
    while (peek() == '*' || peek() == '/') {
        const char op = expr[pos++];
        const int64_t right = parse_unary();
        if (op == '*') {
            value *= right;
        } else if (right == 0) {
            divided_by_zero = true;  // keep evaluating: the whole expression is still parsed
            value = 0;
        } else {
            value /= right;  // C++ division truncates toward zero
        }
    }
    return value;
};
parse_sum = [&]() -> int64_t {
    int64_t value = parse_product();
    while (peek() == '+' || peek() == '-') {
        const char op = expr[pos++];
        const int64_t right = parse_product();
        value = op == '+' ? value + right : value - right;
    }
    return value;
};
const int64_t result = parse_sum();
if (divided_by_zero) {
    return std::nullopt;
}
return result;
}
