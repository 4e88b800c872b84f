$total = 0.0;
foreach ($crates as $items) {
    $total += array_sum($items);
}
return $total;
}
