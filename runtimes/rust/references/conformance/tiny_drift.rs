offsets.iter().map(|offset| offset * factor).collect()
}
