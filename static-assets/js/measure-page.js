// The Measure page: the string and impedance measurement panels on their own, with their own charts.
import('/js/measure-strings.js');
import('/js/measure-air.js');
