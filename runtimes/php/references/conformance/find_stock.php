return $stock[$item] ?? null;
}
