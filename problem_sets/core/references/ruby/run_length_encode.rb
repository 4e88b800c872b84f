text.each_char.chunk_while { |x, y| x == y }.map { |run| "#{run.size}#{run.first}" }.join
end
