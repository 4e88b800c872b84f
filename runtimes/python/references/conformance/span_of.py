return (min(values), max(values)) if values else None
