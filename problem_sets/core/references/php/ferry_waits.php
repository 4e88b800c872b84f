$waits = [];
$count = count($arrivals);
$departure = $interval;
$i = 0;
while ($i < $count) {
    if ($arrivals[$i] > $departure) {
        // Nobody is waiting: skip to the first departure at or after the next arrival.
        $departure = intdiv($arrivals[$i] + $interval - 1, $interval) * $interval;
    }
    $boarded = 0;
    while ($i < $count && $boarded < $capacity && $arrivals[$i] <= $departure) {
        $waits[] = $departure - $arrivals[$i];
        $boarded++;
        $i++;
    }
    $departure += $interval;
}
return $waits;
}
