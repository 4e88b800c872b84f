usort($shifts, static fn (array $x, array $y): int => $x <=> $y);
$merged = [];
foreach ($shifts as [$start, $end]) {
    $last = count($merged) - 1;
    if ($last >= 0 && $start <= $merged[$last][1] + 1) {
        $merged[$last][1] = max($merged[$last][1], $end);
    } else {
        $merged[] = [$start, $end];
    }
}
return $merged;
}
