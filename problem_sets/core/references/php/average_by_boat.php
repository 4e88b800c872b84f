$sums = [];
$counts = [];
foreach ($catches as [$boat, $weight]) {
    $sums[$boat] = ($sums[$boat] ?? 0.0) + $weight;
    $counts[$boat] = ($counts[$boat] ?? 0) + 1;
}
$means = [];
foreach ($sums as $boat => $sum) {
    $means[$boat] = $sum / $counts[$boat];
}
return $means;
}
