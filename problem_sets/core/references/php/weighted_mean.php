$total = 0.0;
$totalWeight = 0.0;
foreach ($values as $i => $value) {
    $total += $value * $weights[$i];
    $totalWeight += $weights[$i];
}
return $totalWeight === 0.0 ? null : $total / $totalWeight;
}
