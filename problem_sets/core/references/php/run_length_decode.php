preg_match_all('/([0-9]+)([^0-9])/su', $code, $groups, PREG_SET_ORDER);
$text = '';
foreach ($groups as [, $count, $char]) {
    $text .= str_repeat($char, (int) $count);
}
return $text;
}
