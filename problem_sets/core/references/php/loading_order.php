// Kahn's algorithm, always loading the smallest ready item. Names serve as array keys, which
// PHP turns into ints when they look like decimal numbers, so keys are cast back to strings;
// sort() with SORT_STRING compares bytes, and UTF-8 byte order is code point order.
$prerequisites = [];
$users = [];
foreach ($deps as $item => $before) {
    $prerequisites[$item] ??= [];
    foreach ($before as $other) {
        $prerequisites[$other] ??= [];
        $prerequisites[$item][$other] = true;
        $users[$other][$item] = true;
    }
}
$waiting = array_map('count', $prerequisites);
$ready = [];
foreach ($waiting as $item => $count) {
    if ($count === 0) {
        $ready[] = (string) $item;
    }
}
$order = [];
while ($ready !== []) {
    sort($ready, SORT_STRING);
    $item = array_shift($ready);
    $order[] = $item;
    foreach (array_keys($users[$item] ?? []) as $user) {
        $waiting[$user]--;
        if ($waiting[$user] === 0) {
            $ready[] = (string) $user;
        }
    }
}
return count($order) === count($prerequisites) ? $order : null;
}
