text.split([' ', '\t', '\n'])
    .filter(|part| !part.is_empty())
    .collect::<Vec<_>>()
    .join(" ")
}
