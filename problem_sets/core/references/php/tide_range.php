if ($readings === []) {
    return 0;
}
return max($readings) - min($readings);
}
