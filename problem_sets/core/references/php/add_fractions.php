$gcd = static function (int $x, int $y): int {
    $x = abs($x);
    $y = abs($y);
    while ($y !== 0) {
        [$x, $y] = [$y, $x % $y];
    }
    return $x;
};
$num = 0;
$den = 1;
foreach ($fracs as [$p, $q]) {
    if ($q < 0) {
        $p = -$p;
        $q = -$q;
    }
    // Add over the least common denominator, which keeps the intermediate values small.
    $common = intdiv($den, $gcd($den, $q)) * $q;
    $num = $num * intdiv($common, $den) + $p * intdiv($common, $q);
    $den = $common;
    $divisor = $gcd($num, $den);
    $num = intdiv($num, $divisor);
    $den = intdiv($den, $divisor);
}
return [$num, $den];
}
