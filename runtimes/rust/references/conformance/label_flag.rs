let (name, enabled) = entry;
format!("{}{}{}", name, if enabled { ":on" } else { ":off" }, suffix.unwrap_or_default())
}
