$gaps = [];
for ($i = 1; $i < count($positions); $i++) {
    $gaps[] = $positions[$i] - $positions[$i - 1];
}
return $gaps;
}
