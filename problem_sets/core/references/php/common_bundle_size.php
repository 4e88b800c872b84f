// Euclid's algorithm on the signed values: % keeps it exact even for PHP_INT_MIN, whose
// absolute value is not an int; only the final divisor is made positive.
$divisor = 0;
foreach ($counts as $count) {
    $x = $divisor;
    $y = $count;
    while ($y !== 0) {
        [$x, $y] = [$y, $x % $y];
    }
    $divisor = $x;
}
return abs($divisor);
}
