points
    .windows(2)
    .map(|pair| {
        let (x1, y1) = pair[0];
        let (x2, y2) = pair[1];
        (x2 - x1).hypot(y2 - y1)
    })
    .sum()
}
