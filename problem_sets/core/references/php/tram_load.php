$onBoard = 0;
$refused = 0;
foreach ($stops as [$alighting, $boarding]) {
    $onBoard -= min($alighting, $onBoard);
    $taken = min($boarding, $capacity - $onBoard);
    $onBoard += $taken;
    $refused += $boarding - $taken;
}
return [$onBoard, $refused];
}
