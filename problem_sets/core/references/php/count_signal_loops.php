// Names serve as array keys; PHP turns decimal-looking keys into ints, so keys read back
// from an array are cast to string before they are used as names.
$nodes = [];
foreach ($adj as $from => $targets) {
    $nodes[$from] = true;
    foreach ($targets as $to) {
        $nodes[$to] = true;
    }
}
// reach[x]: every lighthouse x reaches along one or more links.
$reach = [];
foreach (array_keys($nodes) as $node) {
    $seen = [];
    $stack = $adj[$node] ?? [];
    while ($stack !== []) {
        $next = array_pop($stack);
        if (!isset($seen[$next])) {
            $seen[$next] = true;
            array_push($stack, ...($adj[$next] ?? []));
        }
    }
    $reach[$node] = $seen;
}
// A lighthouse that reaches itself lies on a loop: the members reach it and it reaches them.
$assigned = [];
$loops = 0;
foreach ($reach as $node => $seen) {
    if (isset($assigned[$node]) || !isset($seen[$node])) {
        continue;
    }
    foreach (array_keys($seen) as $other) {
        if (isset($reach[$other][$node])) {
            $assigned[$other] = true;
        }
    }
    $loops++;
}
return $loops;
}
