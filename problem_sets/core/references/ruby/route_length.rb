points.each_cons(2).sum(0.0) { |(x1, y1), (x2, y2)| Math.hypot(x2 - x1, y2 - y1) }
end
