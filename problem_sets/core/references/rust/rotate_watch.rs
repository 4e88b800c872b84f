let mut crew = crew;
if crew.is_empty() {
    return crew;
}
let places = (k % crew.len() as i64) as usize;
crew.rotate_left(places);
crew
}
