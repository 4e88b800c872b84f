[$name, $enabled] = $entry;
return $name . ($enabled ? ':on' : ':off') . ($suffix ?? '');
}
