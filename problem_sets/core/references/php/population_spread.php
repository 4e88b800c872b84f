$count = count($values);
if ($count === 0) {
    return 0.0;
}
$mean = array_sum($values) / $count;
$squares = array_map(static fn (float $value): float => ($value - $mean) ** 2, $values);
return sqrt(array_sum($squares) / $count);
}
