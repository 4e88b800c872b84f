$count = count($depths);
if ($count === 0) {
    return null;
}
sort($depths);
$mid = intdiv($count, 2);
return $count % 2 === 1 ? $depths[$mid] : ($depths[$mid - 1] + $depths[$mid]) / 2;
}
