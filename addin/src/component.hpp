// component.hpp - the UNO component behind the Calc functions. Its method
// list is generated from the catalogue (dispatch.hpp); only the service
// plumbing is written by hand.
#ifndef TUBEHEAT_ADDIN_COMPONENT_HPP
#define TUBEHEAT_ADDIN_COMPONENT_HPP

#include "dispatch.hpp"

#include <com/sun/star/lang/XServiceInfo.hpp>
#include <cppuhelper/implbase2.hxx>
#include <org/tubeheat/XCalcFunctions.hpp>

namespace th_addin {

// Chosen once and stored in every saved workbook: never change.
constexpr char kServiceName[] = "org.tubeheat.CalcFunctions";

class CalcFunctions
    : public ::cppu::WeakImplHelper2<::org::tubeheat::XCalcFunctions,
                                     ::com::sun::star::lang::XServiceInfo> {
  public:
    TH_ADDIN_GENERATED_METHODS

    // XServiceInfo
    ::rtl::OUString SAL_CALL getImplementationName() override;
    sal_Bool SAL_CALL supportsService(const ::rtl::OUString &name) override;
    ::com::sun::star::uno::Sequence<::rtl::OUString>
        SAL_CALL getSupportedServiceNames() override;
};

}  // namespace th_addin

#endif
