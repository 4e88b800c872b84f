// The decimal text of the int holds the digits of its absolute value, even for PHP_INT_MIN.
$total = 0;
foreach (str_split(ltrim((string) $n, '-')) as $digit) {
    $total += (int) $digit;
}
return $total;
}
