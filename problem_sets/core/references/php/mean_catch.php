if ($weights === []) {
    return null;
}
return array_sum($weights) / count($weights);
}
