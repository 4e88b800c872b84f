return [fill if reading != reading else reading for reading in readings]
