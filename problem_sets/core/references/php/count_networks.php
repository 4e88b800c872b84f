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
$networks = count($docks);
foreach ($links as [$a, $b]) {
    $rootA = $find($a);
    $rootB = $find($b);
    if ($rootA !== $rootB) {
        $parent[$rootA] = $rootB;
        $networks--;
    }
}
return $networks;
}
