// Names are array keys, which PHP makes ints when they look like decimal numbers.
$names = [];
foreach ($tally as $name => $count) {
    if ($count === $target) {
        $names[] = (string) $name;
    }
}
// SORT_STRING compares bytes, and UTF-8 byte order is code point order.
sort($names, SORT_STRING);
return $names;
}
