text.reverse
end
