if ($values === []) {
    return null;
}
return [min($values), max($values)];
}
