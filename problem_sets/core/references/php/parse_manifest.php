$totals = [];
foreach (explode("\n", $text) as $line) {
    if (trim($line, " \t") === '') {
        continue;
    }
    [$name, $quantity] = explode(':', $line, 2);
    $name = trim($name, " \t");
    $totals[$name] = ($totals[$name] ?? 0) + (int) trim($quantity, " \t");
}
return $totals;
}
