[entries.length, marks.sum]
end
