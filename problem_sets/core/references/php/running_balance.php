$balance = 0;
$balances = [];
foreach ($deltas as $delta) {
    $balance += $delta;
    $balances[] = $balance;
}
return $balances;
}
