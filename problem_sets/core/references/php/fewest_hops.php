if ($start === $goal) {
    return 0;
}
// Breadth-first search: docks are settled in order of their number of trips.
$trips = [$start => 0];
$queue = [$start];
for ($head = 0; $head < count($queue); $head++) {
    $dock = $queue[$head];
    foreach ($adj[$dock] ?? [] as $next) {
        if (isset($trips[$next])) {
            continue;
        }
        $trips[$next] = $trips[$dock] + 1;
        if ($next === $goal) {
            return $trips[$next];
        }
        $queue[] = $next;
    }
}
return null;
}
