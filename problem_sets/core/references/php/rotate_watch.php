if ($crew === []) {
    return [];
}
$r = $k % count($crew);
return array_merge(array_slice($crew, $r), array_slice($crew, 0, $r));
}
