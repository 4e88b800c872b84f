if ($n === 0) {
    return '0';
}
$digits = '0123456789abcdefghijklmnopqrstuvwxyz';
// Work with the non-positive value: the absolute value of PHP_INT_MIN is not an int. For a
// negative dividend % gives a remainder in (-base, 0] and intdiv truncates toward zero.
$rest = $n > 0 ? -$n : $n;
$text = '';
while ($rest !== 0) {
    $text = $digits[-($rest % $base)] . $text;
    $rest = intdiv($rest, $base);
}
return ($n < 0 ? '-' : '') . $text;
}
