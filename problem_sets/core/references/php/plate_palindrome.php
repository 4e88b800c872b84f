// Since PHP 8.2 strtolower() changes ASCII letters only, whatever the locale.
$kept = strtolower(preg_replace('/[^A-Za-z0-9]/', '', $plate));
return $kept === strrev($kept);
}
