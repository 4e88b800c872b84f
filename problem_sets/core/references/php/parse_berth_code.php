// \z, not $: a dollar sign would also match before a final newline.
if (preg_match('/\A([A-Z]+)([0-9]{1,18})\z/', $code, $match) !== 1) {
    return null;
}
return [$match[1], (int) $match[2]];
}
