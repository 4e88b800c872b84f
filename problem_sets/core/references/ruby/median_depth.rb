return nil if depths.empty?

ordered = depths.sort
mid = ordered.size / 2
ordered.size.odd? ? ordered[mid] : (ordered[mid - 1] + ordered[mid]) / 2.0
end
