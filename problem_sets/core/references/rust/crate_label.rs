match name {
    Some(name) if !name.is_empty() => format!("{} #{}", name, number),
    _ => format!("Crate #{}", number),
}
}
