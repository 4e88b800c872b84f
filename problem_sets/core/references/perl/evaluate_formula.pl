    # Recursive descent over the tokens, one lexical sub per precedence level. Integer
    # arithmetic keeps 64-bit values exact and makes / truncate toward zero.
    use integer;
    my @tokens = $expr =~ /[0-9]+|[^ ]/g;
    my $division_by_zero = 0;
    my sub sum;
    my sub unary;
    my sub product () {
        my $value = unary();
        while (@tokens && ($tokens[0] eq '*' || $tokens[0] eq '/')) {
            my $op = shift @tokens;
            my $right = unary();
            if ($op eq '*') {
                $value *= $right;
            } elsif ($right == 0) {
                # Note it and go on parsing; the value no longer matters.
                $division_by_zero = 1;
                $value = 0;
            } else {
                $value /= $right;
            }
        }
        return $value;
    }
    sub sum () {
        my $value = product();
        while (@tokens && ($tokens[0] eq '+' || $tokens[0] eq '-')) {
            my $op = shift @tokens;
            my $right = product();
            $value = $op eq '+' ? $value + $right : $value - $right;
        }
        return $value;
    }
    sub unary () {
        my $token = shift @tokens;
        return -unary() if $token eq '-';
        if ($token eq '(') {
            my $value = sum();
            shift @tokens;    # the closing parenthesis
            return $value;
        }
        return 0 + $token;
    }
    my $value = sum();
    return $division_by_zero ? undef : $value;
}
