if ($fullName === '') {
    return '';
}
$initials = '';
foreach (explode(' ', $fullName) as $word) {
    // Since PHP 8.2 ucfirst() changes ASCII letters only, whatever the locale.
    $initials .= ucfirst(mb_substr($word, 0, 1));
}
return $initials;
}
