/** SI quantities, engineering notation (IEC 60062 letter codes) and IEC 60063 preferred values. */
package org.armature.units;
