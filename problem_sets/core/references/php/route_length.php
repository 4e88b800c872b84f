$total = 0.0;
for ($i = 1; $i < count($points); $i++) {
    [$x1, $y1] = $points[$i - 1];
    [$x2, $y2] = $points[$i];
    $total += hypot($x2 - $x1, $y2 - $y1);
}
return $total;
}
