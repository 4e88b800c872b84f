  return -heading
end
