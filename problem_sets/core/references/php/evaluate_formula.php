// Recursive descent, one method per precedence level.
$parser = new class ($expr) {
    public bool $divisionByZero = false;
    private int $pos = 0;

    public function __construct(private readonly string $expr)
    {
    }

    public function sum(): int
    {
        $value = $this->product();
        for ($op = $this->peek(); $op === '+' || $op === '-'; $op = $this->peek()) {
            $this->pos++;
            $right = $this->product();
            $value = $op === '+' ? $value + $right : $value - $right;
        }
        return $value;
    }

    private function product(): int
    {
        $value = $this->unary();
        for ($op = $this->peek(); $op === '*' || $op === '/'; $op = $this->peek()) {
            $this->pos++;
            $right = $this->unary();
            if ($op === '*') {
                $value *= $right;
            } elseif ($right === 0) {
                // Note it and go on parsing; the value no longer matters.
                $this->divisionByZero = true;
                $value = 0;
            } else {
                $value = intdiv($value, $right);
            }
        }
        return $value;
    }

    private function unary(): int
    {
        $next = $this->peek();
        if ($next === '-') {
            $this->pos++;
            return -$this->unary();
        }
        if ($next === '(') {
            $this->pos++;
            $value = $this->sum();
            $this->peek();
            $this->pos++;
            return $value;
        }
        $length = strspn($this->expr, '0123456789', $this->pos);
        $value = (int) substr($this->expr, $this->pos, $length);
        $this->pos += $length;
        return $value;
    }

    private function peek(): string
    {
        while (($this->expr[$this->pos] ?? '') === ' ') {
            $this->pos++;
        }
        return $this->expr[$this->pos] ?? '';
    }
};
$value = $parser->sum();
return $parser->divisionByZero ? null : $value;
}
