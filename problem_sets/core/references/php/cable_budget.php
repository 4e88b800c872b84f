// Kruskal's algorithm: take the cheapest cables that join two separate networks.
$parent = [];
foreach ($docks as $dock) {
    $parent[$dock] = $dock;
}
$find = static function (string $dock) use (&$parent): string {
    while ($parent[$dock] !== $dock) {
        $parent[$dock] = $parent[$parent[$dock]];
        $dock = $parent[$dock];
    }
    return $dock;
};
usort($cables, static fn (array $x, array $y): int => $x[2] <=> $y[2]);
$total = 0;
$joined = 0;
foreach ($cables as [$a, $b, $cost]) {
    $rootA = $find($a);
    $rootB = $find($b);
    if ($rootA !== $rootB) {
        $parent[$rootA] = $rootB;
        $total += $cost;
        $joined++;
    }
}
return count($docks) <= 1 || $joined === count($docks) - 1 ? $total : null;
}
