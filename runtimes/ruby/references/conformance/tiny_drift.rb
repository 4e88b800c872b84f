offsets.map { |offset| offset * factor }
end
