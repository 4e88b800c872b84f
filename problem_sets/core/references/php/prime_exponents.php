// Trial division: n <= 10^12, so divisors stay below 10^6. The primes become int keys in
// PHP, which report as the same decimal strings.
$exponents = [];
for ($d = 2; $d * $d <= $n; $d++) {
    while ($n % $d === 0) {
        $exponents[$d] = ($exponents[$d] ?? 0) + 1;
        $n = intdiv($n, $d);
    }
}
if ($n > 1) {
    $exponents[$n] = ($exponents[$n] ?? 0) + 1;
}
return $exponents;
}
