$product = [];
foreach ($a as $i => $row) {
    foreach (array_keys($b[0]) as $j) {
        $sum = 0;
        foreach ($row as $t => $value) {
            $sum += $value * $b[$t][$j];
        }
        $product[$i][$j] = $sum;
    }
}
return $product;
}
