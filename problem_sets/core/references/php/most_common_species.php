// Names come back from array_count_values() as keys, which PHP makes ints when they look like
// decimal numbers; strcmp() compares bytes, and UTF-8 byte order is code point order.
$best = null;
$bestCount = 0;
foreach (array_count_values($species) as $name => $count) {
    $name = (string) $name;
    if ($count > $bestCount || ($count === $bestCount && strcmp($name, $best) < 0)) {
        $best = $name;
        $bestCount = $count;
    }
}
return $best;
}
