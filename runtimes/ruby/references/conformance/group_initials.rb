names.reject(&:empty?).group_by { |name| name[0] }
end
