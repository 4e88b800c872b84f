name, enabled = entry
return name + (":on" if enabled else ":off") + (suffix if suffix is not None else "")
