if ($readings === []) {
    return 0.0;
}
return array_sum($readings) / count($readings);
}
