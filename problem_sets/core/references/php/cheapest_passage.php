if ($start === $goal) {
    return 0;
}
$graph = [];
foreach ($routes as [$a, $b, $cost]) {
    $graph[$a][] = [$b, $cost];
    $graph[$b][] = [$a, $cost];
}
// Dijkstra's algorithm; SplPriorityQueue extracts the highest priority, so costs are negated.
$queue = new SplPriorityQueue();
$queue->setExtractFlags(SplPriorityQueue::EXTR_BOTH);
$queue->insert($start, 0);
$best = [$start => 0];
$settled = [];
while (!$queue->isEmpty()) {
    ['data' => $island, 'priority' => $priority] = $queue->extract();
    if (isset($settled[$island])) {
        continue;
    }
    $settled[$island] = true;
    $cost = -$priority;
    if ($island === $goal) {
        return $cost;
    }
    foreach ($graph[$island] ?? [] as [$next, $step]) {
        $candidate = $cost + $step;
        if (!isset($best[$next]) || $candidate < $best[$next]) {
            $best[$next] = $candidate;
            $queue->insert($next, -$candidate);
        }
    }
}
return null;
}
