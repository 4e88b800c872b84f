// best[r]: the largest worth of a load weighing at most r, using the crates seen so far.
$best = array_fill(0, $capacity + 1, 0);
foreach ($weights as $i => $weight) {
    for ($room = $capacity; $room >= $weight; $room--) {
        $best[$room] = max($best[$room], $best[$room - $weight] + $values[$i]);
    }
}
return $best[$capacity];
}
