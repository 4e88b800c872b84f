values
    .into_iter()
    .map(|value| {
        let value = low.map_or(value, |low| value.max(low));
        high.map_or(value, |high| value.min(high))
    })
    .collect()
}
