$totals = [];
foreach ($grid as $row) {
    foreach ($row as $j => $value) {
        $totals[$j] = ($totals[$j] ?? 0) + $value;
    }
}
return $totals;
}
