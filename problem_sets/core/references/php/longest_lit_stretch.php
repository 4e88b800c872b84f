$best = 0;
$run = 0;
foreach ($states as $lit) {
    $run = $lit ? $run + 1 : 0;
    $best = max($best, $run);
}
return $best;
}
