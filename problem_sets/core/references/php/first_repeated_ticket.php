$seen = [];
foreach ($tickets as $code) {
    if (isset($seen[$code])) {
        return $code;
    }
    $seen[$code] = true;
}
return null;
}
