// component.cpp - service plumbing of the Calc add-in: XServiceInfo, the two
// companion functions, and the factory the UNO shared-library loader calls.
#include "component.hpp"

#include "runtime.hpp"

#include <com/sun/star/lang/XSingleComponentFactory.hpp>
#include <cppuhelper/factory.hxx>
#include <uno/environment.h>
#include <uno/lbnames.h>

#include <cstring>

namespace th_addin {

namespace uno = ::com::sun::star::uno;

::rtl::OUString SAL_CALL CalcFunctions::getImplementationName() {
    return ::rtl::OUString::createFromAscii(kServiceName);
}

sal_Bool SAL_CALL CalcFunctions::supportsService(const ::rtl::OUString &name) {
    return name.equalsAscii(kServiceName);
}

uno::Sequence<::rtl::OUString> SAL_CALL
CalcFunctions::getSupportedServiceNames() {
    uno::Sequence<::rtl::OUString> names(1);
    names.getArray()[0] = ::rtl::OUString::createFromAscii(kServiceName);
    return names;
}

::rtl::OUString SAL_CALL
CalcFunctions::why(const ::rtl::OUString &functionName,
                   const uno::Sequence<uno::Any> &arguments) {
    return explain(functionName, arguments);
}

double SAL_CALL CalcFunctions::status(const ::rtl::OUString &functionName,
                                      const uno::Sequence<uno::Any> &arguments) {
    return status_of(functionName, arguments);
}

namespace {
uno::Reference<uno::XInterface> SAL_CALL
create(const uno::Reference<uno::XComponentContext> &) {
    return static_cast<::cppu::OWeakObject *>(new CalcFunctions);
}
}  // namespace

}  // namespace th_addin

extern "C" {

SAL_DLLPUBLIC_EXPORT void SAL_CALL component_getImplementationEnvironment(
    const char **env_type_name, uno_Environment **) {
    *env_type_name = CPPU_CURRENT_LANGUAGE_BINDING_NAME;
}

SAL_DLLPUBLIC_EXPORT void *SAL_CALL component_getFactory(
    const char *implementation_name, void *, void *) {
    if (implementation_name == nullptr ||
        std::strcmp(implementation_name, th_addin::kServiceName) != 0)
        return nullptr;
    ::com::sun::star::uno::Sequence<::rtl::OUString> services(1);
    services.getArray()[0] =
        ::rtl::OUString::createFromAscii(th_addin::kServiceName);
    ::com::sun::star::uno::Reference<
        ::com::sun::star::lang::XSingleComponentFactory>
        factory = ::cppu::createSingleComponentFactory(
            th_addin::create,
            ::rtl::OUString::createFromAscii(th_addin::kServiceName), services);
    if (!factory.is()) return nullptr;
    factory->acquire();
    return factory.get();
}

}  // extern "C"
