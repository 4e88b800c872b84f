$merged = $a;
foreach ($b as $ship => $count) {
    $merged[$ship] = ($merged[$ship] ?? 0) + $count;
}
return $merged;
}
