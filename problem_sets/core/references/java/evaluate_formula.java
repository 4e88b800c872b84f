    class Parser {
        int pos = 0;
        boolean divisionByZero = false;

        char peek() {
            while (pos < expr.length() && expr.charAt(pos) == ' ') {
                pos++;
            }
            return pos < expr.length() ? expr.charAt(pos) : '\0';
        }

        long sum() {
            long value = product();
            for (char op = peek(); op == '+' || op == '-'; op = peek()) {
                pos++;
                long right = product();
                value = op == '+' ? value + right : value - right;
            }
            return value;
        }

        long product() {
            long value = unary();
            for (char op = peek(); op == '*' || op == '/'; op = peek()) {
                pos++;
                long right = unary();
                if (op == '*') {
                    value *= right;
                } else if (right == 0) {
                    divisionByZero = true;
                } else {
                    value /= right;
                }
            }
            return value;
        }

        long unary() {
            if (peek() == '-') {
                pos++;
                return -unary();
            }
            if (peek() == '(') {
                pos++;
                long value = sum();
                peek();
                pos++;
                return value;
            }
            int begin = pos;
            while (pos < expr.length() && Character.isDigit(expr.charAt(pos))) {
                pos++;
            }
            return Long.parseLong(expr.substring(begin, pos));
        }
    }
    Parser parser = new Parser();
    long value = parser.sum();
    return parser.divisionByZero ? null : value;
}
