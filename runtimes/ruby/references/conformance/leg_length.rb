in_.include?(type) ? end_ - from : default
end
